'use client';

import { createContext, useContext, type ReactNode } from 'react';

// not-found.tsx gets no params: the layout hands down the words of the refusal, naming the company (from a genuine
// token only), in the browser's language.
export type RefusalWords = { title: string; text: string };
const Words = createContext<RefusalWords>({ title: '', text: '' });

export function RefusedLinkProvider({ words, children }: { words: RefusalWords; children: ReactNode }) {
  return <Words.Provider value={words}>{children}</Words.Provider>;
}

export function RefusedLinkMessage() {
  const { title, text } = useContext(Words);
  return (
    <div className="mx-auto max-w-lg p-8 text-center">
      <h1 className="text-2xl font-bold">{title}</h1>
      <p className="mt-3 text-slate-700">{text}</p>
    </div>
  );
}
