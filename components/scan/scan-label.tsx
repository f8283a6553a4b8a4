'use client';

import { useTranslations } from 'next-intl';
import { useEffect, useRef, useState } from 'react';
import { buttonVariants } from '@/components/ui/button';
import { decodeImageFile, startCameraScan, type CameraScan } from '@/lib/client/barcode';
import { Gs1Error } from '@/lib/scan/gs1';
import { describeLabel, labelOf, type ScannedLabel } from '@/lib/scan/label';

export type { ScannedLabel };

/**
 * "Scan label": reads a resin kit's barcode with the camera (or from a photo) and hands back the lot (GS1 AI 10)
 * and the expiry (AI 17). A barcode without GS1 data is taken as the lot itself. Typing stays possible beside it.
 */
export function ScanLabel({
  onScan,
  size = 'desk',
}: {
  onScan: (label: ScannedLabel) => void;
  size?: 'desk' | 'field';
}) {
  const t = useTranslations('scan');
  const [scanning, setScanning] = useState(false);
  const [message, setMessage] = useState<{ text: string; problem: boolean } | null>(null);
  const video = useRef<HTMLVideoElement>(null);
  const photo = useRef<HTMLInputElement>(null);
  const camera = useRef<CameraScan | null>(null);

  useEffect(() => () => camera.current?.stop(), []);

  const accept = (raw: string) => {
    try {
      const label = labelOf(raw);
      setMessage({ text: describeLabel(label, t), problem: false });
      onScan(label);
    } catch (error) {
      setMessage({
        text: error instanceof Gs1Error ? t('unreadableWhy', { reason: error.message }) : t('unreadable'),
        problem: true,
      });
    }
  };

  const openCamera = async () => {
    setMessage(null);
    setScanning(true);
    try {
      // The video element is rendered once `scanning` is set; wait a frame for it.
      await new Promise((resolve) => requestAnimationFrame(resolve));
      camera.current = await startCameraScan(video.current!, (raw) => {
        camera.current?.stop();
        setScanning(false);
        accept(raw);
      });
    } catch {
      setScanning(false);
      setMessage({
        text: t('noCamera'),
        problem: true,
      });
    }
  };

  const closeCamera = () => {
    camera.current?.stop();
    camera.current = null;
    setScanning(false);
  };

  const fromPhoto = async (file: File | undefined) => {
    if (!file) return;
    setMessage({ text: t('reading'), problem: false });
    try {
      accept(await decodeImageFile(file));
    } catch {
      setMessage({
        text: t('noBarcode'),
        problem: true,
      });
    } finally {
      if (photo.current) photo.current.value = '';
    }
  };

  return (
    <div className="space-y-2" data-testid="scan-label">
      <div className="flex flex-wrap gap-2">
        <button
          type="button"
          className={buttonVariants({ variant: 'secondary', size })}
          onClick={() => void (scanning ? closeCamera() : openCamera())}
        >
          {scanning ? t('stop') : t('scan')}
        </button>
        <button
          type="button"
          className={buttonVariants({ variant: 'ghost', size })}
          onClick={() => photo.current?.click()}
        >
          {t('fromPhoto')}
        </button>
        <input
          ref={photo}
          type="file"
          accept="image/*"
          capture="environment"
          className="sr-only"
          tabIndex={-1}
          aria-label={t('photoLabel')}
          data-testid="scan-photo-input"
          onChange={(event) => void fromPhoto(event.target.files?.[0])}
        />
      </div>
      {scanning && (
        <video
          ref={video}
          className="aspect-video w-full max-w-md rounded-md bg-slate-900"
          muted
          playsInline
          aria-label={t('cameraView')}
        />
      )}
      {message && (
        <p
          role={message.problem ? 'alert' : 'status'}
          className={`text-sm font-medium ${message.problem ? 'text-missed-700' : 'text-slate-700'}`}
          data-testid="scan-message"
        >
          {message.text}
        </p>
      )}
    </div>
  );
}
