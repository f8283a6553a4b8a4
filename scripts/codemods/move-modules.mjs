#!/usr/bin/env node
// Moves TypeScript modules and rewrites every import of them, so a file move is one mechanical step that can
// be run again on another branch or a merged tree. Usage:
//   node scripts/codemods/move-modules.mjs old/path.ts=new/path.ts [more pairs…]
// For each pair: `git mv` (skipped when the old file is already gone and the new one exists), then in every
// tracked .ts/.tsx/.mjs/.cjs/.mts file: `@/old` imports (and vi.mock / import() strings) become `@/new`;
// relative imports that reach a moved file, and relative imports inside a moved file, are rewritten from where
// the importing file now stands.
import { execFileSync } from 'node:child_process';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join, normalize, relative } from 'node:path';

const pairs = process.argv.slice(2).map((arg) => arg.split('='));
if (!pairs.length || pairs.some((p) => p.length !== 2)) {
  console.error('usage: move-modules.mjs old.ts=new.ts …');
  process.exit(2);
}
const EXT = /\.(tsx?|mts)$/;
const noExt = (path) => path.replace(EXT, '');
const moves = new Map(pairs.map(([from, to]) => [noExt(normalize(from)), noExt(normalize(to))]));

for (const [from, to] of pairs) {
  if (existsSync(from)) {
    execFileSync('mkdir', ['-p', dirname(to)]);
    execFileSync('git', ['mv', from, to]);
  } else if (!existsSync(to)) {
    console.error(`neither ${from} nor ${to} exists`);
    process.exit(1);
  }
}

const files = execFileSync('git', ['ls-files', '*.ts', '*.tsx', '*.mjs', '*.cjs', '*.mts'], { encoding: 'utf8' })
  .split('\n')
  .filter((f) => f && existsSync(f) && !f.startsWith('node_modules/'));
const movedBack = new Map([...moves].map(([from, to]) => [to, from]));
const SPEC = /(from\s+|import\s*\(\s*|import\s+|require\s*\(\s*|vi\.mock\(\s*)(['"])([^'"]+)\2/g;

let changed = 0;
for (const file of files) {
  const text = readFileSync(file, 'utf8');
  // Where this file stood before the move: its relative imports were written from there.
  const wasAt = movedBack.get(noExt(file));
  const dirBefore = dirname(wasAt ? wasAt : file);
  const out = text.replace(SPEC, (whole, lead, quote, spec) => {
    let target = null;
    if (spec.startsWith('@/')) target = normalize(spec.slice(2));
    else if (spec.startsWith('.')) target = normalize(join(dirBefore, spec));
    else return whole;
    const key = noExt(target);
    const moved = moves.get(key) ?? moves.get(join(key, 'index'));
    if (!moved && !(wasAt && spec.startsWith('.'))) return whole;
    const finalTarget = moved ?? target;
    // Alias stays alias; a relative import stays relative, written from where the file stands now.
    if (spec.startsWith('@/')) return `${lead}${quote}@/${finalTarget}${quote}`;
    let rel = relative(dirname(file), finalTarget);
    if (!rel.startsWith('.')) rel = `./${rel}`;
    return `${lead}${quote}${rel}${quote}`;
  });
  if (out !== text) {
    writeFileSync(file, out);
    changed += 1;
  }
}
console.log(`moved ${pairs.length} file(s), rewrote imports in ${changed} file(s)`);
