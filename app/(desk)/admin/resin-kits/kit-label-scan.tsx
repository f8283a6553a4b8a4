'use client';

import Link from 'next/link';
import { useState } from 'react';
import { ScanLabel, type ScannedLabel } from '@/components/scan/scan-label';
import { fetchJson } from '@/lib/client/fetch-json';

type KitList = { items: { id: string; lot: string }[] };

/**
 * "Scan label" on the resin-kit form: fills lot and expiry from the label; a lot already on file is named with a
 * link to it (pick that kit instead of adding it twice).
 */
export function KitLabelScan({ editingId, onLabel }: { editingId?: string; onLabel: (label: ScannedLabel) => void }) {
  const [existing, setExisting] = useState<{ id: string; lot: string } | null>(null);
  const onScan = async (label: ScannedLabel) => {
    onLabel(label);
    setExisting(null);
    if (!label.lot) return;
    try {
      const list = await fetchJson<KitList>(
        `/api/resin-kits?${new URLSearchParams({ q: label.lot, archived: 'true', pageSize: '100' })}`,
      );
      const same = list.items.find(
        (kit) => kit.lot.trim().toUpperCase() === label.lot!.trim().toUpperCase() && kit.id !== editingId,
      );
      setExisting(same ?? null);
    } catch {
      // The form's own save still refuses a duplicate; the hint is a convenience.
    }
  };
  return (
    <div className="space-y-2 md:col-span-2">
      <ScanLabel onScan={(label) => void onScan(label)} />
      {existing && (
        <p role="alert" className="rounded-md bg-near-100 p-2 text-sm" data-testid="kit-scan-existing">
          Lot {existing.lot} is already on file:{' '}
          <Link href={`/admin/resin-kits/${existing.id}`} className="font-semibold text-brand-700 underline">
            open that kit
          </Link>{' '}
          instead of adding it again.
        </p>
      )}
    </div>
  );
}
