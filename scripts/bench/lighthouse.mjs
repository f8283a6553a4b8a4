// One Lighthouse run (the `lighthouse` package's CLI, its default mobile preset with simulated throttling) of a page,
// in Debian's Chromium (CHROME_PATH), signed in by passing the session cookie as an extra header.
import { execFile } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

const CHROME_FLAGS = [
  '--headless=new',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
  '--disable-quic',
].join(' ');

export async function lighthouse(url, cookie) {
  const out = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'setline-lh-')), 'report.json');
  const args = [
    url,
    '--output=json',
    `--output-path=${out}`,
    '--only-categories=performance',
    '--form-factor=mobile',
    '--quiet',
    `--chrome-flags=${CHROME_FLAGS}`,
    '--max-wait-for-load=60000',
    ...(cookie ? [`--extra-headers=${JSON.stringify({ Cookie: cookie })}`] : []),
  ];
  await new Promise((resolve, reject) => {
    execFile(
      'node_modules/.bin/lighthouse',
      args,
      {
        env: { ...process.env, CHROME_PATH: process.env.CHROME_PATH ?? '/usr/bin/chromium' },
        timeout: 240_000,
        maxBuffer: 64 * 1024 * 1024,
      },
      (error, _stdout, stderr) =>
        error ? reject(new Error(`lighthouse ${url}: ${error.message}\n${stderr}`)) : resolve(),
    );
  });
  const report = JSON.parse(fs.readFileSync(out, 'utf8'));
  fs.rmSync(path.dirname(out), { recursive: true, force: true });
  if (report.runtimeError) throw new Error(`lighthouse ${url}: ${report.runtimeError.message}`);
  return {
    lcp: report.audits['largest-contentful-paint'].numericValue,
    tbt: report.audits['total-blocking-time'].numericValue,
    score: report.categories.performance.score,
    finalUrl: report.finalDisplayedUrl ?? report.finalUrl,
  };
}
