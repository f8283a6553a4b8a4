'use client';

import type { ColumnDef } from '@tanstack/react-table';
import { recordColumn } from '@/components/desk/columns';
import { ListTable, type ListTableProps } from '@/components/ui/data-table';
import { label } from '@/lib/domain/vocabulary';
import { formatTemperature, type UnitSystem } from '@/lib/units';
import type { ResinSystemListResponse } from '@/lib/data/resin-systems';

type Row = ResinSystemListResponse['items'][number];

const columnsFor = (units: UnitSystem): ColumnDef<Row, unknown>[] => [
  recordColumn({ id: 'name', header: 'Resin system', href: (id) => `/admin/resin-systems/${id}`, text: (r) => r.name }),
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
}: ListTableProps<Row> & {
  units: UnitSystem;
}) {
  return <ListTable caption="Resin systems" columns={columnsFor(units)} list={list} sort={sort} dir={dir} />;
}
