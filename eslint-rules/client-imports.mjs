// ESLint rule `setline/no-server-import-in-client`: a 'use client' file never imports a server-only module.
// A module is server-only when it is on the list below (the database, the data layer, the server's
// environment, node built-ins) or when its own source starts with `import 'server-only'`. The second check
// reads the imported file, so a module that declares itself server-only is covered without a list entry.
// Why: a client bundle that pulls in Sequelize or a secret either fails the build late or, worse, ships.
import { readFileSync, statSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';

const SERVER_ONLY = [
  /^server-only$/,
  /^node:/,
  /^@\/models(\/|$)/,
  /^@\/lib\/db$/,
  /^@\/lib\/env$/,
  /^@\/lib\/data(\/|$)/,
  /^@\/lib\/queue(\/|$)/,
  /^@\/lib\/storage\/s3$/,
  /^(sequelize|pg|pg-boss|nodemailer|sharp|stripe)$/,
];
const EXTENSIONS = ['.ts', '.tsx', '.js', '.mjs', '/index.ts', '/index.tsx'];
const serverOnlyCache = new Map();
const isFile = (path) => statSync(path, { throwIfNoEntry: false })?.isFile() ?? false;

/** The file an import names, for `@/…` and relative imports; null for packages. */
function resolveImport(source, fromFile, root) {
  let base;
  if (source.startsWith('@/')) base = join(root, source.slice(2));
  else if (source.startsWith('.')) base = resolve(dirname(fromFile), source);
  else return null;
  for (const candidate of [base, ...EXTENSIONS.map((ext) => base + ext)]) if (isFile(candidate)) return candidate;
  return null;
}

function declaresServerOnly(file) {
  if (!serverOnlyCache.has(file)) {
    const text = readFileSync(file, 'utf8');
    serverOnlyCache.set(file, /^\s*import\s+['"]server-only['"]/m.test(text));
  }
  return serverOnlyCache.get(file);
}

const isClientFile = (program) =>
  program.body.some(
    (node, index) => index < 3 && node.type === 'ExpressionStatement' && node.directive === 'use client',
  );

export const noServerImportInClient = {
  meta: {
    type: 'problem',
    docs: { description: "A 'use client' file must not import a server-only module" },
    schema: [],
    messages: {
      serverOnly:
        "'{{source}}' is server-only and cannot be imported by a 'use client' file: pass the data in as props, " +
        'or move the shared pure part to a module without server imports.',
    },
  },
  create(context) {
    const root = context.cwd ?? process.cwd();
    const file = context.filename ?? context.getFilename();
    let client = false;
    const check = (node, source) => {
      if (!client || typeof source !== 'string') return;
      if (node.importKind === 'type') return; // types vanish at build
      const listed = SERVER_ONLY.some((pattern) => pattern.test(source));
      const target = listed ? null : resolveImport(source, file, root);
      if (listed || (target && declaresServerOnly(target))) {
        context.report({ node, messageId: 'serverOnly', data: { source } });
      }
    };
    return {
      Program(program) {
        client = isClientFile(program);
      },
      ImportDeclaration(node) {
        if (node.specifiers.length > 0 && node.specifiers.every((s) => s.importKind === 'type')) return;
        check(node, node.source.value);
      },
      ExportNamedDeclaration(node) {
        if (node.source) check(node, node.source.value);
      },
      ExportAllDeclaration(node) {
        check(node, node.source.value);
      },
      ImportExpression(node) {
        if (node.source.type === 'Literal') check(node, node.source.value);
      },
    };
  },
};

const plugin = { rules: { 'no-server-import-in-client': noServerImportInClient } };
export default plugin;
