'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { submitJson } from '@/lib/client/submit-json';

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
    <span className="inline-flex items-center gap-2">
      <Button type="button" variant="secondary" onClick={restore}>
        Restore
      </Button>
      {message && (
        <span role="alert" className="text-sm text-missed-700">
          {message}
        </span>
      )}
    </span>
  );
}
