'use client';

import { useRouter } from 'next/navigation';
import { useTranslations } from 'next-intl';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { submitJson } from '@/lib/client/submit-json';

/** DELETE on a record's API: the server archives it when anything depends on it, deletes it otherwise. */
export function ArchiveButton({ url, what, backTo }: { url: string; what: string; backTo: string }) {
  const t = useTranslations('common');
  const router = useRouter();
  const [message, setMessage] = useState<string>();
  const [busy, setBusy] = useState(false);
  const archive = async () => {
    if (!window.confirm(t('archiveConfirm', { what }))) return;
    setBusy(true);
    const result = await submitJson(url, 'DELETE');
    setBusy(false);
    if (!result.ok) return setMessage(result.error.message);
    router.push(backTo);
    router.refresh();
  };
  return (
    <span className="inline-flex items-center gap-2">
      <Button type="button" variant="secondary" onClick={archive} disabled={busy}>
        {t('archive')}
      </Button>
      {message && (
        <span role="alert" className="text-sm text-missed-700">
          {message}
        </span>
      )}
    </span>
  );
}
