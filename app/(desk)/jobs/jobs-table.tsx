'use client';

import type { ColumnDef } from '@tanstack/react-table';
import { recordColumn } from '@/components/desk/columns';
import { StatusBadge } from '@/components/ui/badge';
import { ListTable, type ListTableProps } from '@/components/ui/data-table';
import type { JobListResponse } from '@/lib/data/jobs';

type Row = JobListResponse['items'][number];

const columns: ColumnDef<Row, unknown>[] = [
  recordColumn({ id: 'number', header: 'Job', href: (id) => `/jobs/${id}`, text: (r) => r.number, nowrap: true }),
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

export function JobsTable({ list, sort, dir }: ListTableProps<Row>) {
  return <ListTable caption="Jobs" columns={columns} list={list} sort={sort} dir={dir} />;
}
