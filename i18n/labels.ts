import { label } from '@/lib/domain/vocabulary';

type LabelTranslator = { has(key: string): boolean; (key: string): string };

/**
 * A code's label in the reader's language (a translator of the `labels` namespace, from useTranslations,
 * getTranslations or createTranslator), else lib/domain's English label.
 */
export function labelIn(translator: object, code: string): string {
  const t = translator as LabelTranslator;
  return t.has(code) ? t(code) : label(code);
}
