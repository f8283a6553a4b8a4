import Link from 'next/link';
import { useTranslations } from 'next-intl';
import type { ReactNode } from 'react';
import { buttonVariants } from '@/components/ui/button';
import { Input, Select } from '@/components/ui/input';

/**
 * The bar above every desk list: a GET form (so the filter lives in the URL and survives a reload),
 * the list's own filters as children, an "Export CSV" link carrying the same filter, and the "New" button.
 */
export function ListToolbar({
  search,
  placeholder,
  exportHref,
  newHref,
  newLabel,
  children,
}: {
  search?: string;
  placeholder: string;
  exportHref: string;
  newHref?: string;
  newLabel?: string;
  children?: ReactNode;
}) {
  const t = useTranslations('common');
  return (
    <div className="flex flex-wrap items-end justify-between gap-3">
      <form className="flex flex-wrap items-end gap-3 text-sm" role="search">
        <label className="flex flex-col">
          <span className="font-medium">{t('search')}</span>
          <Input name="q" type="search" defaultValue={search ?? ''} placeholder={placeholder} className="w-64" />
        </label>
        {children}
        <button type="submit" className={buttonVariants({ variant: 'secondary' })}>
          {t('filter')}
        </button>
      </form>
      <div className="flex gap-2">
        <a href={exportHref} className={buttonVariants({ variant: 'secondary' })} download>
          {t('export')}
        </a>
        {newHref && (
          <Link href={newHref} className={buttonVariants({ variant: 'primary' })}>
            {newLabel ?? t('new')}
          </Link>
        )}
      </div>
    </div>
  );
}

/** The CSV link of an API list with the page's current filter (paging dropped: the export takes every match). */
export function exportHrefOf(apiPath: string, params: Record<string, string | string[] | undefined>) {
  const query = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) {
    if (typeof value === 'string' && value && key !== 'page' && key !== 'pageSize') query.set(key, value);
  }
  query.set('format', 'csv');
  return `${apiPath}?${query.toString()}`;
}

/** A <select> filter for a ListToolbar. */
export function FilterSelect({
  name,
  label,
  value,
  options,
}: {
  name: string;
  label: string;
  value?: string;
  options: { value: string; label: string }[];
}) {
  const t = useTranslations('common');
  return (
    <label className="flex flex-col">
      <span className="font-medium">{label}</span>
      <Select name={name} defaultValue={value ?? ''}>
        <option value="">{t('any')}</option>
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </Select>
    </label>
  );
}
