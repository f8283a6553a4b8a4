'use client';

import { useLocale, useTranslations } from 'next-intl';
import { useState } from 'react';
import { ScanLabel, type ScannedLabel } from '@/components/scan/scan-label';
import { formatDay } from '@/lib/time/dates-locale';
import type { KitOption } from './step-conditions';

/**
 * "Scan label" on the conditions step: a known lot picks its kit; an unknown one says so and leaves the list to
 * pick from (kits are added by the office, which can open the new-kit form with the scanned lot and expiry).
 */
export function KitScan({
  kits,
  onPick,
  canAddKit = false,
}: {
  kits: KitOption[];
  onPick: (kitId: string) => void;
  canAddKit?: boolean;
}) {
  const t = useTranslations('install.kitScan');
  const locale = useLocale();
  const [unknown, setUnknown] = useState<ScannedLabel | null>(null);
  const [note, setNote] = useState<string | null>(null);

  const onScan = (label: ScannedLabel) => {
    const lot = label.lot?.trim().toUpperCase();
    const kit = lot ? kits.find((k) => k.lot.trim().toUpperCase() === lot) : undefined;
    if (!kit) {
      setUnknown(label);
      setNote(null);
      return;
    }
    setUnknown(null);
    if (kit.expired) {
      setNote(t('expired', { lot: kit.lot, date: formatDay(kit.expiresOn, locale) }));
      return;
    }
    onPick(kit.id);
    const differs = label.expiresOn && label.expiresOn !== kit.expiresOn;
    const dates = differs
      ? t('differs', { label: formatDay(label.expiresOn!, locale), file: formatDay(kit.expiresOn, locale) })
      : '';
    setNote(t('chosen', { lot: kit.lot, differs: dates }));
  };

  const addHref =
    unknown &&
    `/admin/resin-kits/new?${new URLSearchParams({ lot: unknown.lot ?? '', ...(unknown.expiresOn ? { expiresOn: unknown.expiresOn } : {}) })}`;
  return (
    <div className="space-y-2">
      <ScanLabel onScan={onScan} size="field" />
      {note && (
        <p role="status" className="text-base font-medium text-safe-700" data-testid="kit-scan-note">
          {note}
        </p>
      )}
      {unknown && (
        <div role="alert" className="rounded-md bg-near-100 p-3 text-base" data-testid="kit-scan-unknown">
          <p>
            {t.rich('unknown', {
              lot: unknown.lot ?? t('noLot'),
              useBy: unknown.expiresOn ? t('unknownUseBy', { date: formatDay(unknown.expiresOn, locale) }) : '',
              strong: (chunks) => <strong>{chunks}</strong>,
            })}
          </p>
          {canAddKit && addHref && (
            <a href={addHref} className="mt-1 inline-block font-semibold text-brand-700 underline">
              {t('add')}
            </a>
          )}
        </div>
      )}
    </div>
  );
}
