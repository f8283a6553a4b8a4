import bwipjs from 'bwip-js/node';
import sharp from 'sharp';
import {
  BarcodeFormat,
  BinaryBitmap,
  DecodeHintType,
  HybridBinarizer,
  MultiFormatReader,
  RGBLuminanceSource,
} from '@zxing/library';
import { describe, expect, it } from 'vitest';
import { labelOf } from '@/lib/scan/label';

// Labels drawn by bwip-js (a barcode writer) and read back by ZXing's decoder core, the one @zxing/browser runs in
// the page when the browser has no BarcodeDetector, with the same hints (lib/client/barcode.ts). The data uses
// GS1's example GTIN 09506000134352 (from memory; its check digit is worked in gs1.test.ts).
const TODAY = new Date('2026-12-02T12:00:00Z');

async function decode(bcid: string, text: string) {
  const png = await bwipjs.toBuffer({
    bcid,
    text,
    scale: 3,
    height: 12,
    paddingwidth: 12,
    paddingheight: 12,
    backgroundcolor: 'FFFFFF',
  });
  const { data, info } = await sharp(png)
    .flatten({ background: '#ffffff' })
    .greyscale()
    .raw()
    .toBuffer({ resolveWithObject: true });
  expect(info.channels).toBe(1);
  const source = new RGBLuminanceSource(new Uint8ClampedArray(data), info.width, info.height);
  const reader = new MultiFormatReader();
  const hints = new Map<DecodeHintType, unknown>([
    [DecodeHintType.POSSIBLE_FORMATS, [BarcodeFormat.CODE_128, BarcodeFormat.DATA_MATRIX, BarcodeFormat.QR_CODE]],
    [DecodeHintType.ASSUME_GS1, true],
    [DecodeHintType.TRY_HARDER, true],
  ]);
  return reader.decode(new BinaryBitmap(new HybridBinarizer(source)), hints).getText();
}

describe('reading generated labels', () => {
  it('GS1-128: lot and expiry (DD = 00, end of month) through FNC1', async () => {
    const text = await decode('gs1-128', '(01)09506000134352(10)RX-2611-07(17)270600');
    expect(text).toContain('\u001d'); // the FNC1 after the variable-length lot
    expect(labelOf(text, TODAY)).toMatchObject({ gtin: '09506000134352', lot: 'RX-2611-07', expiresOn: '2027-06-30' });
  });

  it('GS1 DataMatrix: expiry before the lot, serial after it', async () => {
    const text = await decode('gs1datamatrix', '(01)09506000134352(17)271130(10)A7B(21)0042');
    expect(labelOf(text, TODAY)).toMatchObject({ lot: 'A7B', expiresOn: '2027-11-30' });
  });

  it('a plain Code 128 lot barcode is taken as the lot', async () => {
    const text = await decode('code128', 'SAE-2610-014');
    expect(labelOf(text, TODAY)).toEqual({ raw: 'SAE-2610-014', lot: 'SAE-2610-014' });
  });
});
