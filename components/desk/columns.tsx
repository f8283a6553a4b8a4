import type { ColumnDef } from '@tanstack/react-table';
import Link from 'next/link';
import type { ReactNode } from 'react';
import { cn } from '@/lib/ui/cn';

/**
 * The first column of a desk list: the record's name (or number) as the link to its page, sortable, with
 * "(archived)" beside an archived record. `nowrap` keeps a number on one line.
 */
export function recordColumn<Row extends { id: string; archivedAt?: string | Date | null }>({
  id,
  header,
  href,
  text,
  nowrap,
}: {
  id: string;
  header: string;
  href: (id: string) => string;
  text: (row: Row) => ReactNode;
  nowrap?: boolean;
}): ColumnDef<Row, unknown> {
  return {
    id,
    header,
    enableSorting: true,
    cell: ({ row }) => (
      <Link
        href={href(row.original.id)}
        className={cn(nowrap && 'whitespace-nowrap', 'font-semibold text-brand-700 hover:underline')}
      >
        {text(row.original)}
        {row.original.archivedAt && <span className="ml-2 text-xs font-normal text-slate-500">(archived)</span>}
      </Link>
    ),
  };
}
