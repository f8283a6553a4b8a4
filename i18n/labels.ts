import { label } from '@/lib/domain';

type LabelTranslator = { has(key: string): boolean; (key: string): string };

/** A code's label in the reader's language (the `labels` namespace), else lib/domain's English label. */
export const labelIn = (t: LabelTranslator, code: string) => (t.has(code) ? t(code) : label(code));
