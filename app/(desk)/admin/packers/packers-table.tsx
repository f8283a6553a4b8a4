'use client';

import type { ColumnDef } from '@tanstack/react-table';
import Link from 'next/link';
import { DataTable } from '@/components/ui/data-table';
import { formatLength, formatPressure, type UnitSystem } from '@/lib/units';
import type { PackerListResponse } from '@/lib/data/packers';

type Row = PackerListResponse['items'][number];

const columnsFor = (units: UnitSystem): ColumnDef<Row, unknown>[] => [
  {
    id: 'name',
    header: 'Packer',
    enableSorting: true,
    cell: ({ row }) => (
      <Link href={`/admin/packers/${row.original.id}`} className="font-semibold text-brand-700 hover:underline">
        {row.original.name}
        {row.original.archivedAt && <span className="ml-2 text-xs font-normal text-slate-500">(archived)</span>}
      </Link>
    ),
  },
  { id: 'serial', header: 'Serial', cell: ({ row }) => row.original.serial ?? '—' },
  {
    id: 'minDiameterMm',
    header: 'From pipe',
    enableSorting: true,
    cell: ({ row }) => formatLength(row.original.minDiameterMm, units),
  },
  {
    id: 'maxDiameterMm',
    header: 'To pipe',
    enableSorting: true,
    cell: ({ row }) => formatLength(row.original.maxDiameterMm, units),
  },
  {
    id: 'bladderLengthMm',
    header: 'Bladder',
    enableSorting: true,
    cell: ({ row }) =>
      `${formatLength(row.original.bladderLengthMm, units)} (ends ${formatLength(row.original.endMarginMm, units)})`,
  },
  {
    id: 'pressure',
    header: 'Pressure',
    cell: ({ row }) =>
      `${formatPressure(row.original.minPressureKpa, units)} – ${formatPressure(row.original.maxPressureKpa, units)}`,
  },
];

export function PackersTable({
  list,
  sort,
  dir,
  units,
}: {
  list: PackerListResponse;
  sort: string;
  dir: 'asc' | 'desc';
  units: UnitSystem;
}) {
  return (
    <DataTable
      caption="Packers"
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
