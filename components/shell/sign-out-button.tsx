'use client';

import { signOut } from 'next-auth/react';
import { useState } from 'react';
import { pendingCount } from '@/lib/client/outbox';

export function SignOutButton({ className = '' }: { className?: string }) {
  const [pending, setPending] = useState(false);
  return (
    <button
      type="button"
      className={className}
      disabled={pending}
      onClick={async () => {
        // Queued taps are sent with whoever is signed in when the signal returns: warn before
        // someone else's name ends up on them.
        const unsynced = await pendingCount().catch(() => 0);
        if (unsynced > 0 && !window.confirm(`${unsynced} tap(s) are still only on this tablet. Wait for the signal so they sync under your name?\n\nOK signs out anyway.`)) return;
        setPending(true);
        void signOut({ callbackUrl: '/sign-in' });
      }}
    >
      {pending ? 'Signing out…' : 'Sign out'}
    </button>
  );
}
