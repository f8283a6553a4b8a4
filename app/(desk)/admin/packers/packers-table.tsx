'use client';

import type { ColumnDef } from '@tanstack/react-table';
import { recordColumn } from '@/components/desk/columns';
import { ListTable, type ListTableProps } from '@/components/ui/data-table';
import { formatLength, formatPressure, type UnitSystem } from '@/lib/units';
import type { PackerListResponse } from '@/lib/data/packers';

type Row = PackerListResponse['items'][number];

const columnsFor = (units: UnitSystem): ColumnDef<Row, unknown>[] => [
  recordColumn({ id: 'name', header: 'Packer', href: (id) => `/admin/packers/${id}`, text: (r) => r.name }),
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
}: ListTableProps<Row> & {
  units: UnitSystem;
}) {
  return <ListTable caption="Packers" columns={columnsFor(units)} list={list} sort={sort} dir={dir} />;
}
