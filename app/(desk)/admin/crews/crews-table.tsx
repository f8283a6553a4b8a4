'use client';

import type { ColumnDef } from '@tanstack/react-table';
import Link from 'next/link';
import { DataTable } from '@/components/ui/data-table';
import type { CrewListResponse } from '@/lib/data/crews';

type Row = CrewListResponse['items'][number];

const columns: ColumnDef<Row, unknown>[] = [
  {
    id: 'name',
    header: 'Crew',
    enableSorting: true,
    cell: ({ row }) => (
      <Link href={`/admin/crews/${row.original.id}`} className="font-semibold text-brand-700 hover:underline">
        {row.original.name}
        {row.original.archivedAt && <span className="ml-2 text-xs font-normal text-slate-500">(archived)</span>}
      </Link>
    ),
  },
  { id: 'dailyCapacity', header: 'Jobs per day', enableSorting: true, cell: ({ row }) => row.original.dailyCapacity },
  { id: 'members', header: 'Members', cell: ({ row }) => row.original.members.map((m) => m.name).join(', ') || '—' },
];

export function CrewsTable({ list, sort, dir }: { list: CrewListResponse; sort: string; dir: 'asc' | 'desc' }) {
  return (
    <DataTable
      caption="Crews"
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
