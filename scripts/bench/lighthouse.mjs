// Lighthouse (mobile preset: the default config, simulated throttling) LCP and TBT of pages of a
// running production server, in Debian's Chromium (CHROME_PATH, default /usr/bin/chromium).
// Each page is measured `runs` times, pages taking turns so machine load hits them alike; the
// median run counts. Loopback only; bounded by the number of runs.
//
//   node scripts/bench/lighthouse.mjs http://127.0.0.1:3512 [email] [path…]
//
// measureLighthouse(baseUrl, cookie, paths, { runs = 3 }) →
//   [{ path, lcpMs, tbtMs, score, runs: [{ lcpMs, tbtMs, score }] }]
import { pathToFileURL } from 'node:url';
import * as chromeLauncher from 'chrome-launcher';
import lighthouse from 'lighthouse';
import { firstInstallPath, signIn } from './sign-in.mjs';

export async function measureLighthouse(baseUrl, cookie, paths, { runs = 3 } = {}) {
  const chrome = await chromeLauncher.launch({
    chromePath: process.env.CHROME_PATH ?? '/usr/bin/chromium',
    chromeFlags: ['--headless=new', '--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  const seen = new Map(paths.map((path) => [path, []]));
  try {
    for (let run = 0; run < runs; run += 1) {
      for (const path of paths) {
        const result = await lighthouse(
          new URL(path, baseUrl).href,
          {
            port: chrome.port,
            output: 'json',
            logLevel: process.env.LIGHTHOUSE_LOG ?? 'error',
            onlyCategories: ['performance'],
            // The session cookie; the page's own requests (scripts, the API) get it from the browser.
            extraHeaders: cookie ? { Cookie: cookie } : undefined,
            // A fresh profile each run: a service worker or cache left by the previous run would flatter it.
            disableStorageReset: false,
          },
        );
        const lhr = result?.lhr;
        if (!lhr) throw new Error(`${path}: lighthouse gave no result`);
        if (lhr.runtimeError) throw new Error(`${path}: ${lhr.runtimeError.code} ${lhr.runtimeError.message}`);
        const finalUrl = new URL(lhr.finalDisplayedUrl ?? lhr.finalUrl ?? path);
        if (finalUrl.pathname !== new URL(path, baseUrl).pathname) throw new Error(`${path}: ended on ${finalUrl.pathname} (signed out?)`);
        seen.get(path).push({
          lcpMs: Math.round(lhr.audits['largest-contentful-paint'].numericValue),
          tbtMs: Math.round(lhr.audits['total-blocking-time'].numericValue),
          score: Math.round((lhr.categories.performance.score ?? 0) * 100),
        });
      }
    }
  } finally {
    chrome.kill();
  }
  return paths.map((path) => {
    const list = seen.get(path);
    const middle = [...list].sort((a, b) => a.lcpMs - b.lcpMs)[Math.floor(list.length / 2)];
    const tbt = [...list].map((r) => r.tbtMs).sort((a, b) => a - b)[Math.floor(list.length / 2)];
    return { path, lcpMs: middle.lcpMs, tbtMs: tbt, score: middle.score, runs: list };
  });
}

if (import.meta.url === pathToFileURL(process.argv[1]).href) {
  const [base, email = 'foreman@demo.test', ...rest] = process.argv.slice(2);
  if (!base) throw new Error('usage: lighthouse.mjs BASE_URL [email] [path…]');
  const cookie = await signIn(base, email);
  const paths = rest.length ? rest : ['/sign-in', await firstInstallPath(base, cookie)];
  const runs = Number(process.env.LIGHTHOUSE_RUNS ?? 3);
  for (const row of await measureLighthouse(base, cookie, paths, { runs })) {
    const each = row.runs.map((r) => `${r.lcpMs}/${r.tbtMs}`).join(' ');
    console.log(`${row.path}\tLCP ${row.lcpMs} ms\tTBT ${row.tbtMs} ms\tscore ${row.score}\t(runs LCP/TBT: ${each})`);
  }
}
