import { createTranslator } from 'next-intl';
import { describe, expect, it } from 'vitest';
import { describeLabel } from '@/lib/scan/label';
import { tooManyAttempts } from '@/lib/security/throttle';
import { ALLOWED_SUMMARY, formatBytes, MAX_BYTES, refusalOf, uploadRefusal } from '@/lib/storage/limits';
import { SIGN_IN_MESSAGES } from '@/lib/validation/sign-in-check';
import en from '@/messages/en.json';
import es from '@/messages/es.json';

// Words the screens now take from the catalogue in place of English written in lib code: the English catalogue
// must say exactly what that code says (the API and the e2e suites read it), Spanish the same facts.

const MB = 1024 * 1024;
const limits = { image: MAX_BYTES.image / MB, video: MAX_BYTES.video / MB };

describe('sign-in words', () => {
  const tEn = createTranslator({ locale: 'en', messages: en, namespace: 'signIn' });
  const tEs = createTranslator({ locale: 'es', messages: es, namespace: 'signIn' });

  it('has each field check’s English message under its key', () => {
    for (const [key, text] of Object.entries(SIGN_IN_MESSAGES)) {
      expect(tEn(`errors.${key as keyof typeof SIGN_IN_MESSAGES}`)).toBe(text);
    }
    expect(tEs('errors.email')).toBe('Escriba el correo electrónico con el que inicia sesión');
  });

  it('says the wait after too many attempts as the server does, in minutes', async () => {
    for (const seconds of [30, 60, 61, 900]) {
      const body = (await tooManyAttempts(seconds).json()) as { error: { message: string } };
      expect(tEn('tooMany', { minutes: Math.max(1, Math.ceil(seconds / 60)) })).toBe(body.error.message);
    }
    expect(tEs('tooMany', { minutes: 15 })).toBe('Demasiados intentos: vuelva a intentarlo dentro de 15 minutos.');
    expect(tEs('tooMany', { minutes: 1 })).toBe('Demasiados intentos: vuelva a intentarlo dentro de 1 minuto.');
  });
});

describe('evidence panel words', () => {
  const tEn = createTranslator({ locale: 'en', messages: en, namespace: 'evidence' });
  const tEs = createTranslator({ locale: 'es', messages: es, namespace: 'evidence' });

  it('states the limits and refusals as lib/storage/limits does', () => {
    expect(tEn('allowed', limits)).toBe(`${ALLOWED_SUMMARY}.`);
    for (const [type, size] of [
      ['text/plain', 10],
      ['', 10],
      ['image/png', 15 * MB + 1],
      ['video/mp4', 300 * MB],
    ] as const) {
      const refusal = refusalOf(type, size)!;
      const english =
        refusal.kind === 'type'
          ? tEn('badType', { type: refusal.contentType || tEn('unknownType'), ...limits })
          : tEn(refusal.type === 'image' ? 'imageTooBig' : 'videoTooBig', {
              size: formatBytes(refusal.size),
              max: formatBytes(MAX_BYTES[refusal.type]),
            });
      expect(english).toBe(uploadRefusal(type, size));
    }
    expect(refusalOf('image/jpeg', 10)).toBeNull();
  });

  it('speaks Spanish', () => {
    expect(tEs('none')).toBe('Aún no hay imágenes ni vídeos.');
    expect(tEs('allowed', limits)).toBe(
      'Imágenes JPEG, PNG o WebP de hasta 15 MB; vídeos MP4, WebM o QuickTime de hasta 200 MB.',
    );
  });
});

describe('scan words', () => {
  const tEn = createTranslator({ locale: 'en', messages: en, namespace: 'scan' });
  const tEs = createTranslator({ locale: 'es', messages: es, namespace: 'scan' });

  it('says what a label gave, in each language', () => {
    const label = { raw: '', lot: 'SAE-2610-014', expiresOn: '2027-01-31' };
    expect(describeLabel(label, tEn)).toBe('Read lot SAE-2610-014, use by 2027-01-31.');
    expect(describeLabel({ raw: '', lot: 'L1' }, tEn)).toBe('Read lot L1.');
    expect(describeLabel(label, tEs)).toBe('Leído: lote SAE-2610-014, usar antes del 2027-01-31.');
  });
});
