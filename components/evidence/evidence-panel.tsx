'use client';

import { useTranslations } from 'next-intl';
import { useId, useRef, useState } from 'react';
import useSWR from 'swr';
import { buttonVariants } from '@/components/ui/button';
import type { AttachmentListResponse, UploadRequestResponse } from '@/lib/data/attachments';
import { fetchJson } from '@/lib/client/fetch-json';
import { submitJson } from '@/lib/client/submit-json';
import { ATTACHMENT_KINDS } from '@/lib/domain/vocabulary';
import { formatBytes, MAX_BYTES, refusalOf, typeOfFile } from '@/lib/storage/limits';
import { cn } from '@/lib/ui/cn';

type Target = { repairId: string } | { installId: string };
type Kind = (typeof ATTACHMENT_KINDS)[number];
type Item = AttachmentListResponse['items'][number];
type Upload = {
  key: string;
  name: string;
  progress: number;
  phase: 'sending' | 'checking' | 'done' | 'failed';
  message?: string;
};

/**
 * Photos and videos of a repair or an install: the tablet camera or picked files go straight to storage
 * (presigned PUT) with progress per file; the server then checks each one and makes its thumbnail.
 */
export function EvidencePanel({
  target,
  initial,
  title,
  size = 'desk',
  defaultKind = 'inspection',
}: {
  target: Target;
  initial?: AttachmentListResponse;
  title: string;
  size?: 'desk' | 'field';
  defaultKind?: Kind;
}) {
  const t = useTranslations('evidence');
  const id = useId();
  const listUrl = `/api/attachments?${new URLSearchParams(target).toString()}`;
  // Signed links last five minutes: fetch fresh ones before they run out.
  const { data, error, mutate } = useSWR<AttachmentListResponse>(
    listUrl,
    (url: string) => fetchJson<AttachmentListResponse>(url),
    {
      fallbackData: initial,
      refreshInterval: 4 * 60_000,
    },
  );
  const [kind, setKind] = useState<Kind>(defaultKind);
  const [caption, setCaption] = useState('');
  const [uploads, setUploads] = useState<Upload[]>([]);
  const [removing, setRemoving] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const counter = useRef(0);
  const field = size === 'field';

  const patch = (key: string, change: Partial<Upload>) =>
    setUploads((all) => all.map((u) => (u.key === key ? { ...u, ...change } : u)));

  async function sendAll(files: FileList | null) {
    if (!files?.length) return;
    const picked = [...files];
    const entries = picked.map((file) => ({
      key: `${counter.current++}`,
      name: file.name,
      progress: 0,
      phase: 'sending' as const,
    }));
    setUploads((all) => [...entries, ...all.filter((u) => u.phase !== 'done')]);
    // One after another: a tablet on a weak signal does better than with several at once.
    for (const [i, file] of picked.entries()) await sendOne(file, entries[i].key);
    await mutate();
  }

  async function sendOne(file: File, key: string) {
    const contentType = typeOfFile(file);
    const refusal = refusalOf(contentType, file.size);
    if (refusal) return patch(key, { phase: 'failed', message: refusalText(refusal) });
    const requested = await submitJson<UploadRequestResponse>('/api/attachments', 'POST', {
      ...target,
      kind,
      fileName: file.name,
      contentType,
      byteSize: file.size,
      ...(caption.trim() ? { caption: caption.trim() } : {}),
    });
    if (!requested.ok) return patch(key, { phase: 'failed', message: requested.error.message });
    const { attachment, upload } = requested.data;
    const sent = await putFile(upload.url, upload.headers, file, (progress) => patch(key, { progress }));
    if (!sent) return patch(key, { phase: 'failed', message: t('notSent') });
    patch(key, { phase: 'checking', progress: 1 });
    const completed = await submitJson(`/api/attachments/${attachment.id}/complete`, 'POST');
    if (!completed.ok) return patch(key, { phase: 'failed', message: completed.error.message });
    patch(key, { phase: 'done' });
  }

  async function remove(item: Item) {
    if (!window.confirm(t('removeConfirm', { name: item.originalName ?? t('thisFile') }))) return;
    setRemoving(item.id);
    const answer = await submitJson(`/api/attachments/${item.id}`, 'DELETE');
    setRemoving(null);
    setNotice(answer.ok ? t('removed', { name: item.originalName ?? t('theFile') }) : answer.error.message);
    await mutate();
  }

  const items = data?.items ?? [];
  const limits = { image: MAX_BYTES.image / 1024 / 1024, video: MAX_BYTES.video / 1024 / 1024 };
  const refusalText = (refusal: NonNullable<ReturnType<typeof refusalOf>>) =>
    refusal.kind === 'type'
      ? t('badType', { type: refusal.contentType || t('unknownType'), ...limits })
      : t(refusal.type === 'image' ? 'imageTooBig' : 'videoTooBig', {
          size: formatBytes(refusal.size),
          max: formatBytes(MAX_BYTES[refusal.type]),
        });
  const pickerClass = cn(
    buttonVariants({ variant: 'secondary', size }),
    'cursor-pointer focus-within:ring-2 focus-within:ring-brand-700',
    field && 'min-h-[4rem] flex-1 text-xl',
  );
  return (
    <section
      className={`space-y-4 rounded-xl bg-white ring-1 ring-slate-200 ${field ? 'p-5' : 'p-4'}`}
      aria-labelledby={`${id}-title`}
      data-testid="evidence"
    >
      <h2 id={`${id}-title`} className={field ? 'text-2xl font-bold' : 'text-base font-semibold'}>
        {title}
      </h2>

      <div className={`grid gap-3 ${field ? 'sm:grid-cols-2' : 'sm:grid-cols-[10rem_1fr]'}`}>
        <div>
          <label htmlFor={`${id}-kind`} className={field ? 'block text-lg font-semibold' : 'block text-sm font-medium'}>
            {t('kind')}
          </label>
          <select
            id={`${id}-kind`}
            value={kind}
            onChange={(e) => setKind(e.target.value as Kind)}
            className={`mt-1 block w-full rounded-md border-slate-400 ${field ? 'min-h-touch border-2 text-xl' : 'h-9 border text-sm'}`}
          >
            {ATTACHMENT_KINDS.map((k) => (
              <option key={k} value={k}>
                {t(`kinds.${k}`)}
              </option>
            ))}
          </select>
        </div>
        <div>
          <label
            htmlFor={`${id}-caption`}
            className={field ? 'block text-lg font-semibold' : 'block text-sm font-medium'}
          >
            {t('caption')}
          </label>
          <input
            id={`${id}-caption`}
            value={caption}
            maxLength={300}
            onChange={(e) => setCaption(e.target.value)}
            className={`mt-1 block w-full rounded-md border-slate-400 px-3 ${field ? 'min-h-touch border-2 text-xl' : 'h-9 border text-sm'}`}
          />
        </div>
      </div>

      <div className="flex flex-wrap gap-3">
        <label className={pickerClass}>
          <input
            type="file"
            accept="image/*,video/*"
            capture="environment"
            className="sr-only"
            aria-label={t('takePhoto')}
            onChange={(e) => {
              void sendAll(e.target.files);
              e.target.value = '';
            }}
          />
          {t('takePhoto')}
        </label>
        <label className={pickerClass}>
          <input
            type="file"
            accept="image/*,video/*"
            multiple
            className="sr-only"
            aria-label={t('chooseFiles')}
            onChange={(e) => {
              void sendAll(e.target.files);
              e.target.value = '';
            }}
          />
          {t('chooseFiles')}
        </label>
      </div>
      <p className={field ? 'text-base text-slate-600' : 'text-xs text-slate-600'}>{t('allowed', limits)}</p>

      {uploads.length > 0 && (
        <ul className="space-y-2" aria-label={t('uploads')}>
          {uploads.map((u) => (
            <li
              key={u.key}
              className={`rounded-md p-2 ${u.phase === 'failed' ? 'bg-missed-100 text-missed-700' : 'bg-slate-50'} ${field ? 'text-lg' : 'text-sm'}`}
              data-phase={u.phase}
            >
              <div className="flex items-center justify-between gap-2">
                <span className="truncate font-medium">{u.name}</span>
                <span role="status">
                  {t(`phase.${u.phase}`)}
                  {u.phase === 'sending' ? ` ${Math.round(u.progress * 100)} %` : ''}
                </span>
              </div>
              {u.phase !== 'failed' && u.phase !== 'done' && (
                <progress
                  className="mt-1 h-2 w-full"
                  value={u.progress}
                  max={1}
                  aria-label={t('uploadOf', { name: u.name })}
                />
              )}
              {u.message && (
                <p role="alert" className="mt-1 font-medium">
                  {u.message}
                </p>
              )}
            </li>
          ))}
        </ul>
      )}

      {notice && (
        <p role="status" className={field ? 'text-lg' : 'text-sm'}>
          {notice}
        </p>
      )}
      {error && (
        <p role="alert" className="font-medium text-missed-700">
          {t('loadFailed', { message: error.message })}
        </p>
      )}
      {items.length === 0 && !error ? (
        <p className={field ? 'text-lg text-slate-600' : 'text-sm text-slate-600'}>{t('none')}</p>
      ) : (
        <ul
          className={`grid gap-3 ${field ? 'grid-cols-2 md:grid-cols-3' : 'grid-cols-2 sm:grid-cols-3 lg:grid-cols-4'}`}
          aria-label={t('files', { title })}
        >
          {items.map((item) => (
            <li key={item.id} className="overflow-hidden rounded-lg ring-1 ring-slate-200" data-testid="evidence-item">
              <a href={item.url} target="_blank" rel="noopener noreferrer" className="block bg-slate-100">
                {item.thumbnailUrl ? (
                  // eslint-disable-next-line @next/next/no-img-element -- short-lived signed links from storage, not optimisable
                  <img
                    src={item.thumbnailUrl}
                    alt={item.caption ?? item.originalName ?? t('imageOf', { kind: t(`kinds.${item.kind}`) })}
                    className="aspect-[4/3] w-full object-cover"
                  />
                ) : (
                  <span className="flex aspect-[4/3] items-center justify-center p-2 text-center text-sm font-medium text-slate-700">
                    ▶ {item.originalName ?? t('video')}
                  </span>
                )}
              </a>
              <div className={`space-y-1 p-2 ${field ? 'text-base' : 'text-xs'}`}>
                <p>
                  <span className="rounded bg-brand-50 px-1.5 py-0.5 font-semibold text-brand-800">
                    {t(`kinds.${item.kind}`)}
                  </span>
                  {item.caption ? ` ${item.caption}` : ''}
                </p>
                {item.uploadedByName && <p className="text-slate-600">{item.uploadedByName}</p>}
                {item.canDelete && (
                  <button
                    type="button"
                    onClick={() => void remove(item)}
                    disabled={removing === item.id}
                    className={cn(buttonVariants({ variant: 'ghost', size }), 'w-full text-missed-700')}
                    aria-label={t('removeName', { name: item.originalName ?? t('file') })}
                  >
                    {removing === item.id ? t('removing') : t('remove')}
                  </button>
                )}
              </div>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}

/** PUT with XMLHttpRequest: fetch cannot report upload progress. Resolves false on any failure. */
function putFile(
  url: string,
  headers: Record<string, string>,
  file: File,
  onProgress: (fraction: number) => void,
): Promise<boolean> {
  return new Promise((resolve) => {
    const xhr = new XMLHttpRequest();
    xhr.open('PUT', url);
    for (const [name, value] of Object.entries(headers)) xhr.setRequestHeader(name, value);
    xhr.upload.onprogress = (event) => event.lengthComputable && onProgress(event.loaded / event.total);
    xhr.onload = () => resolve(xhr.status >= 200 && xhr.status < 300);
    xhr.onerror = () => resolve(false);
    xhr.onabort = () => resolve(false);
    xhr.send(file);
  });
}
