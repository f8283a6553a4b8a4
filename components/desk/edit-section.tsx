'use client';

import { createContext, useContext, useId, useState, type ReactNode } from 'react';
import { useTranslations } from 'next-intl';
import { Button } from '@/components/ui/button';

const CloseContext = createContext<(() => void) | undefined>(undefined);

/**
 * The one way a desk record is edited: its form on the record's own page, below the facts it changes, opened by
 * its button (settings records, whose page is mostly the form, show the form without one). Closed, the form is not
 * rendered at all, so the page has no second field with the same label. A form inside calls `useCloseEditSection()`
 * after saving.
 */
export function EditSection({ label, children }: { label: string; children: ReactNode }) {
  const t = useTranslations('common');
  const [open, setOpen] = useState(false);
  const id = useId();
  return (
    <section aria-label={label} className="space-y-3">
      <Button type="button" variant="secondary" aria-expanded={open} aria-controls={id} onClick={() => setOpen(!open)}>
        {open ? t('closeForm') : label}
      </Button>
      <div id={id} hidden={!open}>
        <CloseContext.Provider value={() => setOpen(false)}>{open && children}</CloseContext.Provider>
      </div>
    </section>
  );
}

/** Closes the EditSection around the caller; undefined on a page of its own (/things/new). */
export function useCloseEditSection() {
  return useContext(CloseContext);
}
