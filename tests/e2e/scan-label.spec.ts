import bwipjs from 'bwip-js/node';
import { expect, test, type Page } from '@playwright/test';
import { hydrated, signIn } from './helpers';
import { acknowledgeAndCheck, newInstall, tap } from './install-helpers';

// "Scan label" fed through its photo fallback ("Scan from photo", a file input): a label drawn by bwip-js is
// decoded in the page (Debian's Chromium has no BarcodeDetector, so this runs the ZXing path). GS1 data: lot in AI
// 10, expiry in AI 17 (DD = 00 is the month's last day, GS1 General Specifications §3.4.6).
async function label(bcid: 'gs1-128' | 'gs1datamatrix', text: string) {
  const buffer = await bwipjs.toBuffer({
    bcid,
    text,
    scale: 3,
    height: 12,
    paddingwidth: 12,
    paddingheight: 12,
    backgroundcolor: 'FFFFFF',
  });
  return { name: 'label.png', mimeType: 'image/png', buffer };
}

async function scanPhoto(page: Page, file: Awaited<ReturnType<typeof label>>) {
  await page.getByTestId('scan-photo-input').setInputFiles(file);
}

test.describe('scan a resin kit label', () => {
  test('the admin adds a kit from its label: lot and expiry filled, an existing lot pointed to', async ({ page }) => {
    await signIn(page, 'admin@demo.test');
    // The sign-in form posts itself, then navigates: wait for the session before going elsewhere.
    await expect(page).not.toHaveURL(/\/sign-in/);
    await page.goto('/admin/resin-kits/new');
    await hydrated(page);
    await expect(page.getByRole('button', { name: 'Scan label' })).toBeVisible();
    await scanPhoto(page, await label('gs1-128', '(01)09506000134352(10)NEW-LOT-77(17)271100'));
    await expect(page.getByTestId('scan-message')).toHaveText('Read lot NEW-LOT-77, use by 2027-11-30.');
    await expect(page.getByLabel('Lot number')).toHaveValue('NEW-LOT-77');
    await expect(page.getByLabel('Use by (expiry date)')).toHaveValue('2027-11-30');
    await expect(page.getByTestId('kit-scan-existing')).toHaveCount(0);
    // Typing stays possible.
    await page.getByLabel('Lot number').fill('NEW-LOT-78');
    await expect(page.getByLabel('Lot number')).toHaveValue('NEW-LOT-78');

    await scanPhoto(page, await label('gs1datamatrix', '(01)09506000134352(17)280300(10)SAE-2610-014'));
    await expect(page.getByTestId('kit-scan-existing')).toContainText('Lot SAE-2610-014 is already on file');
  });

  test('on the conditions step a known lot picks its kit and an unknown one is offered the list', async ({ page }) => {
    await signIn(page, 'foreman@demo.test');
    // The sign-in form posts itself, then navigates: wait for the session before going elsewhere.
    await expect(page).not.toHaveURL(/\/sign-in/);
    const id = await newInstall(page, '-0002', 0);
    await page.goto(`/installs/${id}`);
    await acknowledgeAndCheck(page);
    await tap(page, 'Start dry run');
    await tap(page, 'Packer back — stop');
    await expect(page.getByTestId('step-conditions')).toBeVisible();

    await scanPhoto(page, await label('gs1datamatrix', '(01)09506000134352(10)SAE-2610-014'));
    const kitId = await page.locator('#resinKitId option', { hasText: 'SAE-2610-014' }).getAttribute('value');
    await expect(page.locator('#resinKitId')).toHaveValue(kitId!);
    await expect(page.getByTestId('kit-scan-note')).toContainText('Kit SAE-2610-014 chosen.');

    await scanPhoto(page, await label('gs1-128', '(10)ZZ-NOT-HERE(17)270600'));
    await expect(page.getByTestId('kit-scan-unknown')).toContainText(
      'Lot ZZ-NOT-HERE, use by 2027-06-30, is not among',
    );
    await expect(page.locator('#resinKitId')).toHaveValue(kitId!); // the earlier choice stands; the list is there to pick from
  });
});
