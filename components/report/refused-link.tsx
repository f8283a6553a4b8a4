'use client';

import { createContext, useContext, type ReactNode } from 'react';

// not-found.tsx gets no params: the layout hands the company's name (from a genuine token only) down here.
const CompanyName = createContext<string | null>(null);

export function RefusedLinkProvider({ companyName, children }: { companyName: string | null; children: ReactNode }) {
  return <CompanyName.Provider value={companyName}>{children}</CompanyName.Provider>;
}

export function RefusedLinkMessage() {
  const companyName = useContext(CompanyName);
  return (
    <div className="mx-auto max-w-lg p-8 text-center">
      <h1 className="text-2xl font-bold">Repair report</h1>
      <p className="mt-3 text-slate-700">
        This link is not valid or has expired — ask {companyName ?? 'the company that sent it'} for a new one.
      </p>
    </div>
  );
}
