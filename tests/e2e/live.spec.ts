import { expect, test, type BrowserContext, type Page } from '@playwright/test';
import { signIn } from './helpers';
import { newInstall, tap, waitForSync } from './install-helpers';

// The live board and the tablets, each in a browser of its own, fed by the live stream (server-sent events):
// while a stream is open the screens poll only once a minute, so an update within 2 s came through the stream.

test.describe.configure({ timeout: 180_000 });
// The tablets' taps go straight to the network (as in the other multi-tablet specs).
test.use({ serviceWorkers: 'block' });

/** Within 2 s of the tap reaching the server (the brief's bound), with a little room for the browser to paint. */
const PUSHED = { timeout: 2_500 };

async function expectStreamOpen(page: Page) {
  await expect(page.getByTestId('live-status')).toHaveAttribute('data-stream', 'live', { timeout: 20_000 });
}

test('the live board updates from the stream when a tablet in another browser taps', async ({ browser }) => {
  const officeContext = await trackStreams(await browser.newContext());
  const foremanContext = await browser.newContext();
  const office = await officeContext.newPage();
  const trail = boardTrail(office);
  const foreman = await foremanContext.newPage();
  await signIn(office, 'office@demo.test');
  await expect(office).toHaveURL(/\/jobs/, { timeout: 30_000 });
  await signIn(foreman, 'foreman@demo.test');
  await expect(foreman).toHaveURL('/today', { timeout: 30_000 });

  await office.getByRole('link', { name: 'Live' }).click();
  await expect(office).toHaveURL('/live');
  await expect(office.getByRole('heading', { name: 'Live', level: 1 })).toBeVisible();
  await expectStreamOpen(office);

  const id = await newInstall(foreman, '-0003', 0);
  await foreman.goto(`/installs/${id}`);
  const card = office.locator(`[data-testid="live-install"][data-install-id="${id}"]`);
  await expect(card).toHaveCount(0);

  // The first tap starts the install: it appears on the board with what the crew is at now.
  await tap(foreman, 'Understood — start');
  await expect(foreman.getByTestId('step-checks')).toBeVisible();
  await waitForSync(foreman);
  trail.mark(`first tap synced (install ${id})`);
  await expect(card)
    .toHaveAttribute('data-step', 'checks', { timeout: 5_000 })
    .catch(async (error: unknown) => {
      // What the board saw, so a failure names its cause: the stream's messages and the board's refetches.
      console.log(await trail.dump());
      throw error;
    });
  await expect(card).toContainText('Pre-install checks');
  await expect(card).toContainText('Job ');

  for (const box of await foreman.getByRole('checkbox').all()) await box.check();
  await tap(foreman, 'Checks done');
  await waitForSync(foreman);
  await expect(card).toHaveAttribute('data-step', 'dry_run', PUSHED);
  await expect(card.getByTestId('live-step')).toHaveText('Dry run');

  await tap(foreman, 'Start dry run');
  await waitForSync(foreman);
  await tap(foreman, 'Packer back — stop');
  await waitForSync(foreman);
  await expect(card).toHaveAttribute('data-step', 'conditions', PUSHED);
  // The board never reloaded: the same document took every update.
  expect(await office.evaluate(() => performance.getEntriesByType('navigation').length)).toBe(1);

  await foremanContext.close();
  await officeContext.close();
});

test('two tablets on the same install show each other’s taps within 2 s', async ({ browser }) => {
  const foremanContext = await trackStreams(await browser.newContext());
  const techContext = await trackStreams(await browser.newContext());
  const foreman = await foremanContext.newPage();
  const tech = await techContext.newPage();
  await signIn(foreman, 'foreman@demo.test');
  await signIn(tech, 'tech@demo.test');
  await expect(foreman).toHaveURL('/today', { timeout: 30_000 });
  await expect(tech).toHaveURL('/today', { timeout: 30_000 });
  const id = await newInstall(foreman, '-0003', 0);
  await foreman.goto(`/installs/${id}`);
  await tech.goto(`/installs/${id}`);
  await expect(foreman.getByTestId('step-safety')).toBeVisible();
  await expect(tech.getByTestId('step-safety')).toBeVisible();
  // Both tablets have their stream open before anyone taps.
  await expect.poll(() => openStreams(tech), { timeout: 20_000 }).toBe(1);
  await expect.poll(() => openStreams(foreman), { timeout: 20_000 }).toBe(1);

  await tap(foreman, 'Understood — start');
  await waitForSync(foreman);
  await expect(tech.getByTestId('step-checks')).toBeVisible(PUSHED);

  for (const box of await tech.getByRole('checkbox').all()) await box.check();
  await tap(tech, 'Checks done');
  await waitForSync(tech);
  await expect(foreman.getByTestId('step-dry-run')).toBeVisible(PUSHED);

  await foremanContext.close();
  await techContext.close();
});

test('the live board passes an accessibility check', async ({ page }) => {
  const { default: AxeBuilder } = await import('@axe-core/playwright');
  await signIn(page, 'office@demo.test');
  await expect(page).toHaveURL(/\/jobs/, { timeout: 30_000 });
  await page.goto('/live');
  await expectStreamOpen(page);
  const results = await new AxeBuilder({ page }).analyze();
  expect(results.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`)).toEqual([]);
});

/**
 * A timeline of what the board's page saw: every message its EventSources delivered (recorded in the page by
 * trackStreams) and every answer of /api/live/board with the ids in progress. Printed when the board misses a tap.
 */
function boardTrail(page: Page) {
  const started = Date.now();
  const lines: string[] = [];
  const at = () => `+${((Date.now() - started) / 1000).toFixed(2)}s`;
  page.on('response', async (response) => {
    if (!response.url().includes('/api/live/board')) return;
    const body = await response.json().catch(() => null);
    const ids = (body?.inProgress ?? []).map((i: { id: string; step: string }) => `${i.id.slice(0, 8)}:${i.step}`);
    lines.push(`${at()} board ${response.status()} in progress [${ids.join(' ')}]`);
  });
  page.on('console', (message) => {
    if (message.text().startsWith('[stream]')) lines.push(`${at()} ${message.text()}`);
  });
  return {
    mark: (text: string) => lines.push(`${at()} ${text}`),
    dump: async () => {
      const sources = await page
        .evaluate(() =>
          ((window as unknown as { __liveSources?: EventSource[] }).__liveSources ?? []).map(
            (s) => `${s.url} readyState ${s.readyState}`,
          ),
        )
        .catch(() => ['(page gone)']);
      return ['board trail:', ...lines, `sources: ${sources.join('; ')}`].join('\n');
    },
  };
}

/** EventSources of the page that are open (readyState 1), counted by wrapping the constructor at start-up. */
async function openStreams(page: Page) {
  return page.evaluate(
    () =>
      ((window as unknown as { __liveSources?: EventSource[] }).__liveSources ?? []).filter((s) => s.readyState === 1)
        .length,
  );
}

/** Keeps a handle on every EventSource the context's pages open, so a test can see the stream is up before tapping. */
async function trackStreams(context: BrowserContext) {
  await context.addInitScript(() => {
    const Original = window.EventSource;
    if (!Original) return;
    const sources: EventSource[] = [];
    (window as unknown as { __liveSources: EventSource[] }).__liveSources = sources;
    window.EventSource = class extends Original {
      constructor(url: string | URL, init?: EventSourceInit) {
        super(url, init);
        sources.push(this);
        // Read by boardTrail when a board misses a tap.
        const say = (what: string) => console.log(`[stream] ${sources.length} ${what}`);
        this.addEventListener('open', () => say('open'));
        this.addEventListener('error', () => say(`error, readyState ${this.readyState}`));
        this.addEventListener('ready', (e) => say(`ready ${(e as MessageEvent).data}`));
        this.addEventListener('reset', (e) => say(`reset ${(e as MessageEvent).data}`));
        this.addEventListener('message', (e) => say(`message ${(e as MessageEvent).data.slice(0, 160)}`));
      }
    } as typeof EventSource;
  });
  return context;
}
