'use client';

import type { ColumnDef } from '@tanstack/react-table';
import Link from 'next/link';
import { DataTable } from '@/components/ui/data-table';
import { label } from '@/lib/domain/vocabulary';
import { formatTemperature, type UnitSystem } from '@/lib/units';
import type { ResinSystemListResponse } from '@/lib/data/resin-systems';

type Row = ResinSystemListResponse['items'][number];

const columnsFor = (units: UnitSystem): ColumnDef<Row, unknown>[] => [
  {
    id: 'name',
    header: 'Resin system',
    enableSorting: true,
    cell: ({ row }) => (
      <Link href={`/admin/resin-systems/${row.original.id}`} className="font-semibold text-brand-700 hover:underline">
        {row.original.name}
        {row.original.archivedAt && <span className="ml-2 text-xs font-normal text-slate-500">(archived)</span>}
      </Link>
    ),
  },
  { id: 'chemistry', header: 'Chemistry', enableSorting: true, cell: ({ row }) => label(row.original.chemistry) },
  {
    id: 'refTempC',
    header: 'At',
    enableSorting: true,
    cell: ({ row }) => formatTemperature(row.original.refTempC, units),
  },
  { id: 'potLifeMin', header: 'Pot life', enableSorting: true, cell: ({ row }) => `${row.original.potLifeMin} min` },
  {
    id: 'hold',
    header: 'Hold / full cure',
    cell: ({ row }) => `${row.original.holdMin} / ${row.original.fullCureMin} min`,
  },
  {
    id: 'range',
    header: 'Cure range',
    cell: ({ row }) =>
      `${formatTemperature(row.original.minTempC, units)} – ${formatTemperature(row.original.maxTempC, units)}`,
  },
];

export function ResinSystemsTable({
  list,
  sort,
  dir,
  units,
}: {
  list: ResinSystemListResponse;
  sort: string;
  dir: 'asc' | 'desc';
  units: UnitSystem;
}) {
  return (
    <DataTable
      caption="Resin systems"
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
