import type { ReactNode } from 'react';

/** One step of the install screen: a big white card with the step's title. */
export function StepCard({ title, children, testId }: { title: string; children: ReactNode; testId?: string }) {
  return (
    <section className="space-y-4 rounded-xl bg-white p-5 shadow-sm ring-1 ring-slate-200" data-testid={testId}>
      <h2 className="text-2xl font-bold">{title}</h2>
      {children}
    </section>
  );
}
