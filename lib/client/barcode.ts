// Reads barcodes in the browser: the platform's BarcodeDetector where it exists and knows the label's formats,
// else ZXing's JavaScript decoder, fetched only when a scan starts (it is not in any page's first load).
import type { DecodeHintType as HintType } from '@zxing/library';

export type CameraScan = { stop: () => void };

// GS1-128 (Code 128 with FNC1), GS1 DataMatrix and GS1 QR: what resin labels carry.
const DETECTOR_FORMATS = ['code_128', 'data_matrix', 'qr_code'];

type Detected = { rawValue: string };
type Detector = { detect: (source: ImageBitmapSource) => Promise<Detected[]> };
type DetectorClass = { new (options: { formats: string[] }): Detector; getSupportedFormats: () => Promise<string[]> };

/** The platform's detector when it reads at least one of our formats; null elsewhere (e.g. desktop Linux Chromium). */
async function platformDetector(): Promise<Detector | null> {
  const Class = (globalThis as { BarcodeDetector?: DetectorClass }).BarcodeDetector;
  if (!Class) return null;
  try {
    const formats = (await Class.getSupportedFormats()).filter((f) => DETECTOR_FORMATS.includes(f));
    return formats.length ? new Class({ formats }) : null;
  } catch {
    return null;
  }
}

/** ZXing with the GS1 hint, so FNC1 comes back as GS (ASCII 29) and the element strings can be split. */
async function zxingReader() {
  const [{ BrowserMultiFormatReader }, { BarcodeFormat, DecodeHintType }] = await Promise.all([
    import('@zxing/browser'),
    import('@zxing/library'),
  ]);
  const hints = new Map<HintType, unknown>([
    [DecodeHintType.POSSIBLE_FORMATS, [BarcodeFormat.CODE_128, BarcodeFormat.DATA_MATRIX, BarcodeFormat.QR_CODE]],
    [DecodeHintType.ASSUME_GS1, true],
    [DecodeHintType.TRY_HARDER, true],
  ]);
  return new BrowserMultiFormatReader(hints);
}

/** The text of the first barcode in a photo; rejects when there is none. */
export async function decodeImageFile(file: Blob): Promise<string> {
  const detector = await platformDetector();
  if (detector) {
    const found = await detector.detect(await createImageBitmap(file));
    if (found[0]) return found[0].rawValue;
  }
  const url = URL.createObjectURL(file);
  try {
    return (await (await zxingReader()).decodeFromImageUrl(url)).getText();
  } finally {
    URL.revokeObjectURL(url);
  }
}

/** Shows the back camera in `video` and calls `onText` with each barcode read until stopped. */
export async function startCameraScan(video: HTMLVideoElement, onText: (text: string) => void): Promise<CameraScan> {
  const detector = await platformDetector();
  if (!detector) {
    const controls = await (
      await zxingReader()
    ).decodeFromVideoDevice(undefined, video, (result) => {
      if (result) onText(result.getText());
    });
    return { stop: () => controls.stop() };
  }
  const stream = await navigator.mediaDevices.getUserMedia({ video: { facingMode: 'environment' }, audio: false });
  video.srcObject = stream;
  await video.play();
  let stopped = false;
  const stop = () => {
    stopped = true;
    stream.getTracks().forEach((track) => track.stop());
    video.srcObject = null;
  };
  const tick = async () => {
    if (stopped) return;
    try {
      const found = await detector.detect(video);
      if (found[0] && !stopped) return onText(found[0].rawValue);
    } catch {
      // A frame that is not ready yet; the next one is.
    }
    setTimeout(() => void tick(), 200);
  };
  void tick();
  return { stop };
}
