import http from 'node:http';
import type { AddressInfo, Socket } from 'node:net';
import { expect, request as playwrightRequest, test, type BrowserContext } from '@playwright/test';
import { BASE_URL } from '../../playwright.config';
import { signIn } from './helpers';
import { newInstall, outboxEntries, recordConditions, tap } from './install-helpers';

// An install opened once — here the very first page after sign-in — reloads without signal with its
// clock running and its queued taps listed; 50 taps queued offline across a reload all arrive once, in
// order, with the times they were tapped.
//
// The service worker stays on here. Playwright's offline emulation does not reach the worker's own
// fetches, so "no signal" is made one level down: the tablet's browser reaches the app only through a
// forwarding proxy started by this test on loopback, and "offline" makes that proxy drop every
// connection. The page's emulation is switched too, so the page sees `navigator.onLine` as a tablet would.

type ServerEvent = { clientEventId: string; type: string; deviceTime: string };

const TAPS = 50;
test.describe.configure({ timeout: 300_000 });

test('an install opened once after sign-in works offline across a reload; 50 queued taps arrive once, in order', async ({
  browser,
}) => {
  const proxy = await startSignalProxy(new URL(BASE_URL));
  // The install is made beforehand by the same foreman, on a browser without the proxy.
  const setup = await browser.newContext();
  const setupPage = await setup.newPage();
  await signIn(setupPage, 'foreman@demo.test');
  await expect(setupPage).toHaveURL('/today', { timeout: 30_000 });
  const id = await newInstall(setupPage, '-0003', 0);
  const api = await playwrightRequest.newContext({ baseURL: BASE_URL, storageState: await setup.storageState() });
  await setup.close();

  const tablet = await browser.newContext({ proxy: { server: proxy.url } });
  try {
    const page = await tablet.newPage();
    // Sign in straight onto the install: the first page after sign-in, loaded before any worker ran.
    await page.goto(`/sign-in?callbackUrl=${encodeURIComponent(`/installs/${id}`)}`);
    await page.getByLabel('E-mail').fill('foreman@demo.test');
    await page.getByLabel('Password').fill('setline-demo');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page).toHaveURL(`/installs/${id}`, { timeout: 30_000 });
    await expect(page.getByTestId('step-safety')).toBeVisible({ timeout: 30_000 });
    expect(proxy.requests()).toBeGreaterThan(0);
    // Kept for offline use: the page itself and its data, without the tablet opening it again.
    await expect
      .poll(
        () =>
          page.evaluate(
            async (installId) =>
              Boolean(
                (await caches.match(`/installs/${installId}`, { ignoreVary: true })) &&
                (await caches.match(`/api/installs/${installId}`, { ignoreVary: true })),
              ),
            id,
          ),
        { timeout: 60_000 },
      )
      .toBe(true);

    await setSignal(tablet, proxy, false);
    // Ten taps through the steps to the hold (the clock runs from "Resin mixed")…
    await tap(page, 'Understood — start');
    await expect(page.getByTestId('step-checks')).toBeVisible();
    for (const box of await page.getByRole('checkbox').all()) await box.check();
    await tap(page, 'Checks done');
    await tap(page, 'Start dry run');
    await page.waitForTimeout(2000);
    await tap(page, 'Packer back — stop');
    await recordConditions(page);
    await expect(page.getByTestId('go-verdict')).toHaveText('GO');
    await tap(page, 'Ready to mix');
    await tap(page, 'Resin mixed');
    await tap(page, 'Patch loaded');
    await tap(page, 'Packer in position');
    await page.getByLabel(/Gauge pressure/).fill('15');
    await tap(page, 'Bladder inflated');
    await expect(page.getByTestId('step-hold')).toBeVisible();
    await expect(page.getByTestId('sync-status')).toHaveText(/^10 taps saved on this tablet/);

    // …a reload without signal: the copy kept on the first visit, the clock still running, the taps listed.
    await page.reload();
    await expect(page.getByTestId('step-hold')).toBeVisible({ timeout: 30_000 });
    await expect(page.getByTestId('sync-status')).toHaveText(/^10 taps saved on this tablet/);
    const countdown = page.getByTestId('countdown').first();
    await expect(countdown).toBeVisible();
    const before = await countdown.textContent();
    await expect.poll(() => countdown.textContent(), { timeout: 10_000 }).not.toBe(before);

    // …and forty pressure readings to make fifty.
    for (let i = 10; i < TAPS; i += 1) {
      await page.getByLabel(/Gauge pressure/).fill(String(14 + (i % 3)));
      await tap(page, 'Add pressure reading');
      await expect(page.getByTestId('sync-status')).toHaveText(new RegExp(`^${i + 1} taps saved on this tablet`));
    }
    expect((await serverEvents(api, id)).length).toBe(0);
    const queued = await outboxEntries(page, id);
    expect(queued).toHaveLength(TAPS);

    await setSignal(tablet, proxy, true);
    await expect(page.getByTestId('sync-status')).toHaveText('All taps synced', { timeout: 120_000 });

    const stored = await serverEvents(api, id);
    // Once each, in the order tapped, with the device time the tablet stamped.
    expect(new Set(stored.map((e) => e.clientEventId)).size).toBe(TAPS);
    const byTime = [...stored].sort((a, b) => Date.parse(a.deviceTime) - Date.parse(b.deviceTime));
    expect(
      byTime.map((e) => ({ clientEventId: e.clientEventId, type: e.type, deviceTime: Date.parse(e.deviceTime) })),
    ).toEqual(
      queued.map((e) => ({ clientEventId: e.clientEventId, type: e.type, deviceTime: Date.parse(e.deviceTime) })),
    );
    expect(queued.filter((e) => e.type === 'pressure_reading')).toHaveLength(40);
  } finally {
    await tablet.close();
    await api.dispose();
    await proxy.close();
  }
});

async function setSignal(context: BrowserContext, proxy: SignalProxy, online: boolean) {
  proxy.setOnline(online);
  await context.setOffline(!online);
}

async function serverEvents(
  api: Awaited<ReturnType<typeof playwrightRequest.newContext>>,
  id: string,
): Promise<ServerEvent[]> {
  const response = await api.get(`/api/installs/${id}`);
  expect(response.status()).toBe(200);
  return (await response.json()).events;
}

type SignalProxy = {
  url: string;
  setOnline: (online: boolean) => void;
  requests: () => number;
  close: () => Promise<void>;
};

/**
 * A forwarding HTTP proxy on loopback that only reaches the app under test. Offline, it drops every
 * open connection and each new one, as a lost signal does, for the page and its worker alike.
 */
async function startSignalProxy(target: URL): Promise<SignalProxy> {
  let online = true;
  let count = 0;
  const sockets = new Set<Socket>();
  const server = http.createServer((req, res) => {
    if (!online) return void req.socket.destroy();
    const url = new URL(req.url ?? '/', target);
    if (url.host !== target.host) {
      res.writeHead(403).end();
      return;
    }
    count += 1;
    const upstream = http.request(
      {
        host: target.hostname,
        port: target.port,
        method: req.method,
        path: url.pathname + url.search,
        headers: req.headers,
      },
      (answer) => {
        res.writeHead(answer.statusCode ?? 502, answer.headers);
        answer.pipe(res);
      },
    );
    upstream.on('error', () => req.socket.destroy());
    req.pipe(upstream);
  });
  server.on('connection', (socket) => {
    if (!online) return void socket.destroy();
    sockets.add(socket);
    socket.on('close', () => sockets.delete(socket));
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as AddressInfo;
  return {
    url: `http://127.0.0.1:${port}`,
    setOnline(value) {
      online = value;
      if (!value) for (const socket of sockets) socket.destroy();
    },
    requests: () => count,
    close: () =>
      new Promise<void>((resolve) => {
        for (const socket of sockets) socket.destroy();
        server.close(() => resolve());
      }),
  };
}
