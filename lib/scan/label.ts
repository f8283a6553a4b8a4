import { Gs1Error, looksLikeGs1, parseGs1 } from './gs1';

/** What a scanned resin-kit label gives the forms: the lot (GS1 AI 10) and the expiry (AI 17) when it carries them. */
export type ScannedLabel = { raw: string; lot?: string; expiresOn?: string; gtin?: string };

/** GS1 data parsed, else the whole text taken as the lot (a label with a plain lot barcode). Throws Gs1Error. */
export function labelOf(raw: string, today = new Date()): ScannedLabel {
  if (looksLikeGs1(raw)) {
    const parsed = parseGs1(raw, today);
    if (!parsed.lot && !parsed.expiresOn) throw new Gs1Error('it carries no lot (10) or expiry (17).');
    return { raw, lot: parsed.lot, expiresOn: parsed.expiresOn, gtin: parsed.gtin };
  }
  const lot = raw.trim();
  if (!/^[\x21-\x7e]{1,40}$/.test(lot)) throw new Gs1Error('it is not a lot number.');
  return { raw, lot };
}

type ScanWords = (key: 'read' | 'lot' | 'useBy', values: Record<string, string>) => string;

/** "Read lot X, use by Y.", in the words of the `scan` catalogue namespace (useTranslations('scan')). */
export function describeLabel(label: ScannedLabel, t: ScanWords) {
  const parts = [label.lot && t('lot', { lot: label.lot }), label.expiresOn && t('useBy', { date: label.expiresOn })];
  return t('read', { parts: parts.filter(Boolean).join(', ') });
}
