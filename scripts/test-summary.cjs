// Sums the JSON reports of vitest and Playwright into one closing line: "N passed, N failed".
const fs = require('node:fs');
const path = require('node:path');

const dir = process.argv[2];
let passed = 0;
let failed = 0;
let skipped = 0;
for (const file of fs.existsSync(dir) ? fs.readdirSync(dir) : []) {
  const report = JSON.parse(fs.readFileSync(path.join(dir, file), 'utf8'));
  if ('numPassedTests' in report) {
    passed += report.numPassedTests;
    failed += report.numFailedTests;
    skipped += report.numPendingTests + (report.numTodoTests ?? 0);
  } else if (report.stats) {
    passed += report.stats.expected;
    failed += report.stats.unexpected + report.stats.flaky;
    skipped += report.stats.skipped;
  }
}
console.log(`${passed} passed, ${failed} failed, ${skipped} skipped`);
