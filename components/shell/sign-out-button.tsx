'use client';

import { signOut } from 'next-auth/react';
import { useTranslations } from 'next-intl';
import { useState } from 'react';
import { pendingCount } from '@/lib/client/outbox';

export function SignOutButton({ className = '' }: { className?: string }) {
  const t = useTranslations('common');
  const [pending, setPending] = useState(false);
  return (
    <button
      type="button"
      className={className}
      disabled={pending}
      onClick={async () => {
        // Queued taps are sent only under the user who made them: once signed out, they wait on
        // this tablet until that user signs in here again.
        const unsynced = await pendingCount().catch(() => 0);
        if (unsynced > 0 && !window.confirm(t('signOutConfirm', { count: unsynced }))) return;
        setPending(true);
        void signOut({ callbackUrl: '/sign-in' });
      }}
    >
      {pending ? t('signingOut') : t('signOut')}
    </button>
  );
}
