import type { ReactNode } from 'react';

/** A row of small record actions (restore, status moves) with the last failure beside them as an alert. */
export function InlineActions({ message, children }: { message?: string | null; children: ReactNode }) {
  return (
    <span className="inline-flex items-center gap-2">
      {children}
      {message && (
        <span role="alert" className="text-sm text-missed-700">
          {message}
        </span>
      )}
    </span>
  );
}
