'use client';

import { useTranslations } from 'next-intl';
import { useState } from 'react';
import { PrimaryAction, StepCard } from './field-ui';

type Item = { id: string; label: string; required: boolean };
type Answer = { ok: boolean; note: string };

/** The company's check-list: each item ticked, or a note saying why not. */
export function StepChecks({
  items,
  onDone,
}: {
  items: Item[];
  onDone: (answers: { id: string; ok: boolean; note?: string }[]) => void;
}) {
  const t = useTranslations('install.checks');
  const [answers, setAnswers] = useState<Record<string, Answer>>(() =>
    Object.fromEntries(items.map((i) => [i.id, { ok: false, note: '' }])),
  );
  const set = (id: string, change: Partial<Answer>) =>
    setAnswers((all) => ({ ...all, [id]: { ...all[id], ...change } }));
  const unanswered = items.filter((i) => !answers[i.id].ok && answers[i.id].note.trim().length < 3);
  return (
    <StepCard title={t('title')} testId="step-checks">
      <ul className="space-y-3">
        {items.map((item) => (
          <li key={item.id} className="rounded-lg bg-slate-50 p-3">
            <label className="flex min-h-touch cursor-pointer items-center gap-4 text-lg">
              <input
                type="checkbox"
                className="h-8 w-8 accent-brand-700"
                checked={answers[item.id].ok}
                onChange={(e) => set(item.id, { ok: e.target.checked })}
              />
              <span>
                {item.label}
                {item.required ? '' : t('optional')}
              </span>
            </label>
            {!answers[item.id].ok && (
              <input
                aria-label={t('whyNot', { item: item.label })}
                placeholder={t('whyNotPlaceholder')}
                className="mt-2 min-h-touch w-full rounded-md border-2 border-slate-300 px-3 text-base"
                value={answers[item.id].note}
                onChange={(e) => set(item.id, { note: e.target.value })}
              />
            )}
          </li>
        ))}
      </ul>
      {unanswered.length > 0 && (
        <p className="text-base text-slate-700">{t('unanswered', { count: unanswered.length })}</p>
      )}
      <PrimaryAction
        disabled={unanswered.length > 0}
        onClick={() =>
          onDone(
            items.map((i) => ({
              id: i.id,
              ok: answers[i.id].ok,
              ...(answers[i.id].ok ? {} : { note: answers[i.id].note.trim() }),
            })),
          )
        }
      >
        {t('done')}
      </PrimaryAction>
    </StepCard>
  );
}
