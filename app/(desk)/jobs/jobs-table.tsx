'use client';

import type { ColumnDef } from '@tanstack/react-table';
import Link from 'next/link';
import { StatusBadge } from '@/components/ui/badge';
import { DataTable } from '@/components/ui/data-table';
import type { JobListResponse } from '@/lib/data/jobs';

type Row = JobListResponse['items'][number];

const columns: ColumnDef<Row, unknown>[] = [
  {
    id: 'number',
    header: 'Job',
    enableSorting: true,
    cell: ({ row }) => (
      <Link
        href={`/jobs/${row.original.id}`}
        className="whitespace-nowrap font-semibold text-brand-700 hover:underline"
      >
        {row.original.number}
        {row.original.archivedAt && <span className="ml-2 text-xs font-normal text-slate-500">(archived)</span>}
      </Link>
    ),
  },
  { id: 'title', header: 'Title', enableSorting: true, cell: ({ row }) => row.original.title ?? '—' },
  { id: 'customer', header: 'Customer', cell: ({ row }) => row.original.customer?.name },
  { id: 'site', header: 'Site', cell: ({ row }) => `${row.original.site?.addressLine}, ${row.original.site?.city}` },
  {
    id: 'status',
    header: 'Status',
    enableSorting: true,
    cell: ({ row }) => <StatusBadge status={row.original.status} />,
  },
  {
    id: 'scheduledDate',
    header: 'Scheduled',
    enableSorting: true,
    cell: ({ row }) => row.original.scheduledDate ?? '—',
  },
  { id: 'crew', header: 'Crew', cell: ({ row }) => row.original.crew?.name ?? '—' },
];

export function JobsTable({ list, sort, dir }: { list: JobListResponse; sort: string; dir: 'asc' | 'desc' }) {
  return (
    <DataTable
      caption="Jobs"
      columns={columns}
      data={list.items}
      page={list.page}
      pageCount={list.pageCount}
      total={list.total}
      sort={sort}
      dir={dir}
    />
  );
}
