#!/usr/bin/env node
// No source line over MAX characters in app/, components/ and lib/ (Prettier wraps code at 120; what it
// cannot wrap — long strings, URLs, class lists — must still stay readable). Prints every offending
// line as file:line (length) and exits 1 when there is one.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';

const MAX = Number(process.env.MAX_LINE_LENGTH ?? 160);
const ROOTS = process.argv.slice(2).length ? process.argv.slice(2) : ['app', 'components', 'lib'];
const EXTENSIONS = /\.(ts|tsx|js|jsx|mjs|cjs|css)$/;

function* filesUnder(dir) {
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) yield* filesUnder(path);
    else if (EXTENSIONS.test(entry.name)) yield path;
  }
}

const offenders = [];
for (const root of ROOTS) {
  if (!statSync(root, { throwIfNoEntry: false })?.isDirectory()) continue;
  for (const file of filesUnder(root)) {
    readFileSync(file, 'utf8')
      .split('\n')
      .forEach((line, index) => {
        if (line.length > MAX) offenders.push(`${relative('.', file)}:${index + 1} (${line.length})`);
      });
  }
}

if (offenders.length) {
  console.error(`${offenders.length} line(s) over ${MAX} characters:\n${offenders.join('\n')}`);
  process.exit(1);
}
console.log(`line length: no line over ${MAX} characters in ${ROOTS.join(', ')}`);
