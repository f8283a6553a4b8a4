'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { submitJson } from '@/lib/client/submit-json';
import { label } from '@/lib/domain/vocabulary';
import { cn } from '@/lib/ui/cn';
import { cardClass } from '@/components/ui/card';

type Person = { id: string; name: string; role: string; active: boolean };

/** Ticks the crew's foremen and technicians and saves the whole list (PUT /api/crews/:id/members). */
export function CrewMembers({
  crewId,
  members,
  candidates,
  readOnly,
}: {
  crewId: string;
  members: Person[];
  candidates: Person[];
  readOnly: boolean;
}) {
  const router = useRouter();
  const [chosen, setChosen] = useState(() => new Set(members.map((m) => m.id)));
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<{ ok: boolean; text: string }>();
  // Current members first (a deactivated one stays listed until taken off), then everyone who could join.
  const people = [...members, ...candidates.filter((c) => !members.some((m) => m.id === c.id))];

  const toggle = (id: string) =>
    setChosen((before) => {
      const next = new Set(before);
      if (next.has(id)) next.delete(id);
      else next.add(id);
      return next;
    });
  const save = async () => {
    setBusy(true);
    const result = await submitJson(`/api/crews/${crewId}/members`, 'PUT', { userIds: [...chosen] });
    setBusy(false);
    setMessage(result.ok ? { ok: true, text: 'Members saved.' } : { ok: false, text: result.error.message });
    if (result.ok) router.refresh();
  };

  return (
    <fieldset className={cardClass} disabled={readOnly || busy}>
      <legend className="px-1 text-sm font-semibold uppercase tracking-wide text-slate-600">Members</legend>
      {people.length === 0 && (
        <p className="text-sm text-slate-500">No foremen or technicians yet: add them under Users.</p>
      )}
      <ul className="grid gap-1 text-sm sm:grid-cols-2">
        {people.map((person) => (
          <li key={person.id}>
            <label className="flex items-center gap-2">
              <input type="checkbox" checked={chosen.has(person.id)} onChange={() => toggle(person.id)} />
              <span>{person.name}</span>
              <span className="text-slate-500">
                {label(person.role)}
                {person.active ? '' : ' · deactivated'}
              </span>
            </label>
          </li>
        ))}
      </ul>
      {readOnly && <p className="mt-2 text-sm text-slate-500">Restore the crew to change its members.</p>}
      {message && (
        <p
          role={message.ok ? 'status' : 'alert'}
          className={cn('mt-2 text-sm font-medium', message.ok ? 'text-safe-700' : 'text-missed-700')}
        >
          {message.text}
        </p>
      )}
      {!readOnly && (
        <Button type="button" className="mt-3" onClick={save}>
          {busy ? 'Saving…' : 'Save members'}
        </Button>
      )}
    </fieldset>
  );
}
