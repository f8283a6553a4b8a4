'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { submitJson } from '@/lib/client/submit-json';
import { InlineActions } from '@/components/desk/inline-actions';

/** Brings an archived crew back into the lists (PATCH { archived: false }). */
export function RestoreCrewButton({ crewId }: { crewId: string }) {
  const router = useRouter();
  const [message, setMessage] = useState<string>();
  const restore = async () => {
    const result = await submitJson(`/api/crews/${crewId}`, 'PATCH', { archived: false });
    if (!result.ok) return setMessage(result.error.message);
    router.refresh();
  };
  return (
    <InlineActions message={message}>
      <Button type="button" variant="secondary" onClick={restore}>
        Restore
      </Button>
    </InlineActions>
  );
}
