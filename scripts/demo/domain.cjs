'use strict';
// Loads scripts/demo/domain.ts — the app's TypeScript domain modules — into this CommonJS process:
// esbuild bundles the entry (resolving `@/…` through tsconfig.json, packages left to require) in memory,
// and the bundle is compiled as a module here. One build per process; nothing is written to disk.
const path = require('node:path');
const Module = require('node:module');
const esbuild = require('esbuild');

const ROOT = path.resolve(__dirname, '..', '..');
const ENTRY = path.join(__dirname, 'domain.ts');

function loadDomain() {
  const result = esbuild.buildSync({
    entryPoints: [ENTRY],
    bundle: true,
    platform: 'node',
    format: 'cjs',
    target: 'node20',
    packages: 'external',
    tsconfig: path.join(ROOT, 'tsconfig.json'),
    write: false,
    logLevel: 'silent',
  });
  const compiled = new Module(ENTRY, module);
  compiled.filename = ENTRY;
  compiled.paths = Module._nodeModulePaths(__dirname);
  compiled._compile(result.outputFiles[0].text, ENTRY);
  return compiled.exports;
}

module.exports = loadDomain();
