// The bench smoke's check (npm test, suite "bench"): the table and the JSON of a short bench run hold every
// figure (a)–(i), each with a measured value. Writes a vitest-shaped report (argv[4]) for the closing count.
import fs from 'node:fs';

const [table, json, report] = process.argv.slice(2);
const FIGURES = ['a', 'b', 'c', 'd', 'e', 'f', 'g', 'h', 'i'];
const problems = [];
const text = fs.existsSync(table) ? fs.readFileSync(table, 'utf8') : '';
const data = fs.existsSync(json) ? JSON.parse(fs.readFileSync(json, 'utf8')) : { rows: [] };
if (!text.startsWith('| figure | what | goal | measured | pass/fail |')) problems.push('the table header is missing');
for (const figure of FIGURES) {
  const inJson = data.rows.filter((r) => r.figure === figure);
  if (inJson.length === 0) problems.push(`figure ${figure} is missing from the JSON`);
  for (const r of inJson) if (!r.measured) problems.push(`figure ${figure} has no measured value`);
  if (!new RegExp(`^\\| ${figure} \\|`, 'm').test(text)) problems.push(`figure ${figure} is missing from the table`);
}
// Four pages' first-load JavaScript.
if (data.rows.filter((r) => r.figure === 'g').length !== 4) problems.push('figure g must measure four pages');
for (const p of problems) console.error(`[bench smoke] ${p}`);
console.error(`[bench smoke] ${problems.length ? 'FAILED' : `all ${FIGURES.length} figures present`}`);
fs.writeFileSync(
  report,
  JSON.stringify({
    numPassedTests: problems.length ? 0 : 1,
    numFailedTests: problems.length ? 1 : 0,
    numPendingTests: 0,
  }),
);
process.exit(problems.length ? 1 : 0);
