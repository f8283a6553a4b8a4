'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';
import { useTranslations } from 'next-intl';
import useSWR from 'swr';
import type { NavItem } from '@/config/nav';
import { fetchJson } from '@/lib/client/fetch-json';
import { cn } from '@/lib/ui/cn';

// An item's label is its `key` in the `nav` message namespace; its `countUrl` total is shown beside it, kept fresh
// on focus and every minute.

export function DeskNav({ items }: { items: NavItem[] }) {
  const pathname = usePathname();
  const t = useTranslations('nav');
  return (
    <nav aria-label={t('main')} className="flex flex-col gap-1">
      {items.map((item) => {
        const active = pathname === item.href || pathname.startsWith(`${item.href}/`);
        return (
          <Link
            key={item.href}
            href={item.href}
            aria-current={active ? 'page' : undefined}
            className={cn(
              'flex items-center justify-between rounded-md px-3 py-2 text-sm font-medium',
              active ? 'bg-brand-700 text-white' : 'text-slate-200 hover:bg-slate-800',
            )}
          >
            {item.key ? t(item.key) : item.label}
            {item.countUrl && (
              <NavCount url={item.countUrl} id={item.key ?? String(item.label).toLowerCase()} waiting={t('waiting')} />
            )}
          </Link>
        );
      })}
    </nav>
  );
}

function NavCount({ url, id, waiting }: { url: string; id: string; waiting: string }) {
  const { data } = useSWR<{ total: number }>(url, fetchJson, { refreshInterval: 60_000, revalidateOnFocus: true });
  if (!data?.total) return null;
  return (
    <span
      data-testid={`nav-count-${id}`}
      className="ml-2 rounded-full bg-near-500 px-2 text-xs font-bold text-slate-900"
    >
      {data.total}
      <span className="sr-only"> {waiting}</span>
    </span>
  );
}
