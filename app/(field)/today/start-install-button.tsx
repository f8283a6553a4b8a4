'use client';

import { useRouter } from 'next/navigation';
import { useTranslations } from 'next-intl';
import { useState } from 'react';
import { buttonVariants } from '@/components/ui/button';
import { fetchJson } from '@/lib/client/fetch-json';
import { cn } from '@/lib/ui/cn';

/** Creates the install with an id made here, so a retried tap finds the same install. */
export function StartInstallButton({ repairId, label }: { repairId: string; label: string }) {
  const t = useTranslations('today');
  const router = useRouter();
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [id] = useState(() => crypto.randomUUID());
  return (
    <div>
      <button
        type="button"
        className={cn(buttonVariants({ variant: 'primary', size: 'field' }), 'w-full sm:w-auto')}
        disabled={pending}
        onClick={async () => {
          setPending(true);
          setError(null);
          try {
            await fetchJson('/api/installs', {
              method: 'POST',
              headers: { 'content-type': 'application/json' },
              body: JSON.stringify({ id, repairId }),
            });
            router.push(`/installs/${id}`);
          } catch (e) {
            setError(e instanceof Error ? e.message : t('startFailed'));
            setPending(false);
          }
        }}
      >
        {pending ? t('starting') : label}
      </button>
      {error && (
        <p role="alert" className="mt-1 text-base text-missed-700">
          {error} {t('needsSignal')}
        </p>
      )}
    </div>
  );
}
