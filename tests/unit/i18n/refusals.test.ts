import { createTranslator } from 'next-intl';
import { describe, expect, it } from 'vitest';
import { formatMessage } from '@/i18n/format-message';
import { deviceTimeRefusal } from '@/lib/install/record-rules';
import { REFUSAL_KEYS, refusal, type Refusal, type RefusalKey } from '@/lib/i18n/refusals';
import { ALLOWED_SUMMARY, allowedTypes } from '@/lib/storage/limits';
import en from '@/messages/en.json';
import es from '@/messages/es.json';

// The tap route answers a refusal's English as it always did (tests and desks compare it) and, for a Spanish
// user, the catalogue message beside it: the English catalogue must give back that English exactly.

const tEn = createTranslator({ locale: 'en', messages: en, namespace: 'lib' });
const tEs = createTranslator({ locale: 'es', messages: es, namespace: 'lib' });

/** Every refusal with each of the values it is made with (a nested sentence as the routes nest it). */
const make = refusal as (k: RefusalKey, v?: Record<string, string | Refusal>) => Refusal;
const VALUES: Partial<Record<RefusalKey, Record<string, string | Refusal>[]>> = {
  closed: [{ status: 'approved' }, { status: 'abandoned' }],
  uploadClosed: [{ status: 'approved' }, { status: 'abandoned' }],
  fileOfType: [{ ext: 'PDF' }],
  kitExpired: [{ lot: 'L-204', day: '2026-11-30' }],
  allowed: [{ image: '15', video: '200' }],
  uploadSize: [{ arrived: '2 KB', declared: '1.3 MB' }],
  uploadType: [
    { name: 'pipe.jpg', what: make('fileOfType', { ext: 'PDF' }), allowed: allowedTypes() },
    { name: make('thisFile'), what: make('unreadableFile'), allowed: allowedTypes() },
  ],
  imageTooLarge: [{ size: '16 MB', max: '15 MB' }],
  videoTooLarge: [{ size: '201 MB', max: '200 MB' }],
  imageUnreadable: [
    { name: 'joint.png', format: 'PNG' },
    { name: make('thisImage'), format: 'WebP' },
  ],
};
const cases = REFUSAL_KEYS.flatMap((key) => {
  if (key.startsWith('time')) return ['deviceTime', 'The corrected time'].map((what) => make(key, { what }));
  return (VALUES[key] ?? [undefined]).map((values) => make(key, values));
});

describe('tap and upload refusals', () => {
  it('say the allowed types as the upload form says them', () => {
    expect(allowedTypes().text).toBe(ALLOWED_SUMMARY);
  });

  it('read in the English catalogue exactly as the English the API answers', () => {
    for (const r of cases) expect(formatMessage(tEn, r.detail, { locale: 'en', system: 'metric' })).toBe(r.text);
  });

  it('have Spanish of their own, with every value filled in', () => {
    for (const r of cases) {
      const text = formatMessage(tEs, r.detail, { locale: 'es', system: 'metric' });
      expect(text, r.detail.key).not.toBe(r.text);
      expect(text, r.detail.key).not.toMatch(/[{}]|approved|abandoned|deviceTime|This (file|image)/);
    }
  });

  it('word the device time bound the tap broke', () => {
    const received = new Date('2026-12-02T12:00:00Z');
    const ahead = deviceTimeRefusal('2026-12-02T12:06:00Z', received);
    expect(ahead?.detail).toEqual({ key: 'refusal.timeAhead', values: { what: 'deviceTime' } });
    expect(formatMessage(tEs, ahead!.detail, { locale: 'es', system: 'metric' })).toMatch(
      /^La hora del toque es más de 5/,
    );
  });
});
