// First-load JavaScript of pages of a running production server: every script the page's HTML
// names (<script src> and <link rel="preload"/"modulepreload" as="script">), fetched once each and
// gzipped here (level 9, as Next's own build report measured it), summed per page. `noModule`
// scripts (Next's polyfills for old browsers) are left out: a current browser never fetches them.
// Loopback only; one request per page and per script.
//
//   node scripts/bench/page-weight.mjs http://127.0.0.1:3512 [email] [path…]
//
// measurePageWeights(baseUrl, cookie, paths) → [{ path, status, scripts, rawBytes, gzipBytes, gzipKb }]
import { gzipSync } from 'node:zlib';
import { pathToFileURL } from 'node:url';
import { signIn } from './sign-in.mjs';

export async function measurePageWeights(baseUrl, cookie, paths) {
  const sizes = new Map();
  const results = [];
  for (const path of paths) {
    const page = await fetch(new URL(path, baseUrl), { headers: cookie ? { cookie } : {}, redirect: 'manual' });
    const html = await page.text();
    if (page.status !== 200) throw new Error(`${path}: the server answered ${page.status}`);
    const scripts = scriptsOf(html);
    let rawBytes = 0;
    let gzipBytes = 0;
    for (const src of scripts) {
      if (!sizes.has(src)) sizes.set(src, await sizeOf(new URL(src, baseUrl)));
      const size = sizes.get(src);
      rawBytes += size.raw;
      gzipBytes += size.gzip;
    }
    results.push({
      path,
      status: page.status,
      scripts: scripts.length,
      rawBytes,
      gzipBytes,
      gzipKb: round1(gzipBytes / 1000),
    });
  }
  return results;
}

/** The script addresses a page's HTML names, once each, in order. */
export function scriptsOf(html) {
  const found = new Set();
  for (const match of html.matchAll(/<script\b[^>]*\bsrc="([^"]+)"[^>]*>/g)) {
    if (!/\bnomodule\b/i.test(match[0])) found.add(decode(match[1]));
  }
  for (const match of html.matchAll(/<link\b[^>]*>/g)) {
    const tag = match[0];
    if (!/\brel="(?:preload|modulepreload)"/.test(tag) || (/\brel="preload"/.test(tag) && !/\bas="script"/.test(tag)))
      continue;
    const href = /\bhref="([^"]+)"/.exec(tag);
    if (href) found.add(decode(href[1]));
  }
  return [...found].filter((src) => src.endsWith('.js') || src.includes('.js?'));
}

async function sizeOf(url) {
  const response = await fetch(url);
  if (!response.ok) throw new Error(`${url}: ${response.status}`);
  const body = Buffer.from(await response.arrayBuffer());
  return { raw: body.length, gzip: gzipSync(body, { level: 9 }).length };
}

const decode = (value) => value.replaceAll('&amp;', '&');
const round1 = (value) => Math.round(value * 10) / 10;

if (import.meta.url === pathToFileURL(process.argv[1]).href) {
  const [base, email = 'foreman@demo.test', ...rest] = process.argv.slice(2);
  if (!base) throw new Error('usage: page-weight.mjs BASE_URL [email] [path…]');
  const cookie = await signIn(base, email);
  const paths = rest.length ? rest : ['/sign-in', '/today'];
  for (const row of await measurePageWeights(base, cookie, paths)) {
    console.log(
      `${row.path}\t${row.scripts} scripts\t${row.gzipKb} kB gzipped\t(${Math.round(row.rawBytes / 1000)} kB raw)`,
    );
  }
}
