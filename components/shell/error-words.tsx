'use client';

import { createContext, useContext, type ReactNode } from 'react';

/** The words of a failure page: what went wrong, that nothing was lost, and the retry button. */
export type ErrorWords = { title: string; body: string; retry: string };

const ErrorWordsContext = createContext<ErrorWords | null>(null);

/**
 * The root layout hands the root failure page (app/error.tsx) its words in the reader's language here: that page
 * has no message catalogue of its own, and giving it one would put the i18n client into every page's first load.
 */
export function ErrorWordsProvider({ words, children }: { words: ErrorWords; children: ReactNode }) {
  return <ErrorWordsContext.Provider value={words}>{children}</ErrorWordsContext.Provider>;
}

export const useErrorWords = () => useContext(ErrorWordsContext);
