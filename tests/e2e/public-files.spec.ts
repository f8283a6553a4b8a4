import { expect, test } from '@playwright/test';

// What a browser fetches before anyone signs in: the web app manifest and its icons, the favicon, robots.txt.
// Each is requested with no session (the proxy must let it through, not redirect to /sign-in).

/** Width and height from a PNG's IHDR chunk (PNG specification, section 11.2.2). */
function pngSize(bytes: Buffer) {
  expect(bytes.subarray(0, 8).toString('hex'), 'PNG signature').toBe('89504e470d0a1a0a');
  return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
}

test('the web app manifest is served, valid, and its icons are PNGs of the sizes it names', async ({ request }) => {
  const response = await request.get('/manifest.webmanifest', { maxRedirects: 0 });
  expect(response.status()).toBe(200);
  expect(response.headers()['content-type']).toContain('application/manifest+json');
  const manifest = await response.json();
  expect(manifest).toMatchObject({
    name: 'Setline',
    short_name: 'Setline',
    start_url: '/today',
    display: 'standalone',
    theme_color: '#115e59', // brand-700 (tailwind.config.ts)
    background_color: '#0f172a', // slate-900, the shells' header bar
  });
  const purposes = manifest.icons.map((icon: { purpose?: string }) => icon.purpose ?? 'any');
  expect(purposes).toContain('maskable');
  const sizes = manifest.icons.map((icon: { sizes: string }) => icon.sizes);
  expect(sizes).toEqual(expect.arrayContaining(['192x192', '512x512']));
  for (const icon of manifest.icons as { src: string; sizes: string; type: string }[]) {
    const file = await request.get(icon.src, { maxRedirects: 0 });
    expect(file.status(), icon.src).toBe(200);
    expect(file.headers()['content-type'], icon.src).toBe(icon.type);
    const { width, height } = pngSize(await file.body());
    expect(`${width}x${height}`, icon.src).toBe(icon.sizes);
  }
});

test('the field screens and sign-in link the manifest and the icons', async ({ page }) => {
  await page.goto('/sign-in');
  await expect(page.locator('link[rel="manifest"]')).toHaveAttribute('href', /\/manifest\.webmanifest/);
  await expect(page.locator('link[rel="icon"]').first()).toHaveAttribute('href', /./);
  await expect(page.locator('meta[name="theme-color"]')).toHaveAttribute('content', '#115e59');
});

test('robots.txt keeps report links and the API out of indexes', async ({ request }) => {
  const response = await request.get('/robots.txt', { maxRedirects: 0 });
  expect(response.status()).toBe(200);
  expect(response.headers()['content-type']).toContain('text/plain');
  const lines = (await response.text()).split('\n').map((line) => line.trim());
  expect(lines).toContain('User-agent: *');
  expect(lines).toContain('Disallow: /r/');
  expect(lines).toContain('Disallow: /api/');
});

test('the favicon and the SVG icon are served to a signed-out browser', async ({ request }) => {
  const ico = await request.get('/favicon.ico', { maxRedirects: 0 });
  expect(ico.status()).toBe(200);
  const bytes = await ico.body();
  // ICONDIR: reserved 0, type 1 (icon), then the number of images (Microsoft's ICO format).
  expect([bytes.readUInt16LE(0), bytes.readUInt16LE(2)]).toEqual([0, 1]);
  expect(bytes.readUInt16LE(4)).toBeGreaterThanOrEqual(1);
  const svg = await request.get('/icon.svg', { maxRedirects: 0 });
  expect(svg.status()).toBe(200);
  expect(svg.headers()['content-type']).toContain('image/svg+xml');
});
