'use client';

import type { ColumnDef } from '@tanstack/react-table';
import { recordColumn } from '@/components/desk/columns';
import { ListTable, type ListTableProps } from '@/components/ui/data-table';
import type { CrewListResponse } from '@/lib/data/crews';

type Row = CrewListResponse['items'][number];

const columns: ColumnDef<Row, unknown>[] = [
  recordColumn({ id: 'name', header: 'Crew', href: (id) => `/admin/crews/${id}`, text: (r) => r.name }),
  { id: 'dailyCapacity', header: 'Jobs per day', enableSorting: true, cell: ({ row }) => row.original.dailyCapacity },
  { id: 'members', header: 'Members', cell: ({ row }) => row.original.members.map((m) => m.name).join(', ') || '—' },
];

export function CrewsTable({ list, sort, dir }: ListTableProps<Row>) {
  return <ListTable caption="Crews" columns={columns} list={list} sort={sort} dir={dir} />;
}
