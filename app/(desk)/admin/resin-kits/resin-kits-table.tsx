'use client';

import type { ColumnDef } from '@tanstack/react-table';
import Link from 'next/link';
import { Badge } from '@/components/ui/badge';
import { DataTable } from '@/components/ui/data-table';
import { formatVolume, type UnitSystem } from '@/lib/units';
import type { ResinKitListResponse } from '@/lib/data/resin-kits';

type Row = ResinKitListResponse['items'][number];

const columnsFor = (units: UnitSystem): ColumnDef<Row, unknown>[] => [
  {
    id: 'lot',
    header: 'Lot',
    enableSorting: true,
    cell: ({ row }) => (
      <Link href={`/admin/resin-kits/${row.original.id}`} className="font-semibold text-brand-700 hover:underline">
        {row.original.lot}
        {row.original.archivedAt && <span className="ml-2 text-xs font-normal text-slate-500">(archived)</span>}
      </Link>
    ),
  },
  { id: 'resinSystem', header: 'Resin system', cell: ({ row }) => row.original.resinSystem.name },
  {
    id: 'expiresOn',
    header: 'Use by',
    enableSorting: true,
    cell: ({ row }) => (
      <span className="inline-flex gap-2">
        {row.original.expiresOn}
        {row.original.expired && <Badge tone="missed">expired</Badge>}
      </span>
    ),
  },
  {
    id: 'quantityL',
    header: 'On hand',
    enableSorting: true,
    cell: ({ row }) => formatVolume(row.original.quantityL, units),
  },
  { id: 'notes', header: 'Notes', cell: ({ row }) => row.original.notes ?? '—' },
];

export function ResinKitsTable({
  list,
  sort,
  dir,
  units,
}: {
  list: ResinKitListResponse;
  sort: string;
  dir: 'asc' | 'desc';
  units: UnitSystem;
}) {
  return (
    <DataTable
      caption="Resin kits"
      columns={columnsFor(units)}
      data={list.items}
      page={list.page}
      pageCount={list.pageCount}
      total={list.total}
      sort={sort}
      dir={dir}
    />
  );
}
