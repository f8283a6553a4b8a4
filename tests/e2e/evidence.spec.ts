import { expect, test } from '@playwright/test';
import sharp from 'sharp';
import { signIn } from './helpers';
import { controlTime, mixAndInflate, newInstall, prepareToMix, tap } from './install-helpers';

// Needs the storage fake (scripts/test.sh starts it and exports S3_*): the browser PUTs straight to it.
test.describe('inspection images', () => {
  test.use({ serviceWorkers: 'block' });

  test('a foreman adds a photo after the bladder is down; a text file posing as a photo is refused', async ({
    page,
  }) => {
    const time = await controlTime(page);
    await signIn(page, 'foreman@demo.test');
    const id = await newInstall(page, '-0002', 0);
    await page.goto(`/installs/${id}`);
    await expect(page.getByTestId('evidence')).toHaveCount(0); // not while the clock runs
    await prepareToMix(page, time.advance);
    await mixAndInflate(page, time.advance);
    // Past the demo resin's hold at 57 °F (about 2 h 17 min) and the company's 10 % hold reserve (2 h 31 min).
    await time.advance(160);
    await tap(page, 'Bladder deflated');
    await expect(page.getByTestId('step-inspect')).toBeVisible();

    const panel = page.getByTestId('evidence');
    await expect(panel.getByRole('heading', { name: 'Inspection images' })).toBeVisible();
    await expect(panel.getByLabel('Take a photo or video')).toHaveAttribute('capture', 'environment');
    await panel.getByLabel('Caption (optional)').fill('Downstream end, tight to the wall');
    const png = await sharp({ create: { width: 640, height: 480, channels: 3, background: '#1f6f6a' } })
      .png()
      .toBuffer();
    await panel.getByLabel('Choose files').setInputFiles({ name: 'patch-end.png', mimeType: 'image/png', buffer: png });
    // The upload runs its phases (sending, checking, done); a failure names its reason in an alert, so a run that
    // goes wrong says why instead of only finding no item.
    await expect(panel.getByRole('list', { name: 'Uploads' }).locator('li').first()).toHaveAttribute(
      'data-phase',
      /done|failed/,
      { timeout: 30_000 },
    );
    expect(await panel.getByRole('alert').allTextContents()).toEqual([]);
    const item = panel.getByTestId('evidence-item');
    await expect(item).toHaveCount(1, { timeout: 20_000 });
    await expect(item).toContainText('Inspection');
    await expect(item).toContainText('Downstream end, tight to the wall');
    // The thumbnail really loads from storage through its signed link.
    const thumb = item.getByRole('img');
    await expect.poll(() => thumb.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(320);

    await panel
      .getByLabel('Choose files')
      .setInputFiles({ name: 'notes.jpg', mimeType: 'image/jpeg', buffer: Buffer.from('not a picture\n'.repeat(50)) });
    await expect(panel.getByRole('alert')).toContainText('not an image or video we can read', { timeout: 20_000 });
    await expect(item).toHaveCount(1);
  });
});
