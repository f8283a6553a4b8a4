import { NextIntlClientProvider } from 'next-intl';
import { getMessages } from 'next-intl/server';
import type { ReactNode } from 'react';

/** Namespaces every client subtree may use (the sign-out button, countdowns). */
const BASE = ['common', 'countdown'] as const;

/**
 * Hands client components only the namespaces they use, never the whole catalogue (it would ride along in every
 * page's payload). A nested scope replaces the one above it, so it names everything its subtree needs.
 */
export async function IntlScope({ namespaces, children }: { namespaces: readonly string[]; children: ReactNode }) {
  const all = (await getMessages()) as Record<string, unknown>;
  const messages = Object.fromEntries([...BASE, ...namespaces].filter((ns) => ns in all).map((ns) => [ns, all[ns]]));
  return <NextIntlClientProvider messages={messages as never}>{children}</NextIntlClientProvider>;
}
