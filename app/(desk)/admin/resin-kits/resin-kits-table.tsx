'use client';

import type { ColumnDef } from '@tanstack/react-table';
import { recordColumn } from '@/components/desk/columns';
import { Badge } from '@/components/ui/badge';
import { ListTable, type ListTableProps } from '@/components/ui/data-table';
import { formatVolume, type UnitSystem } from '@/lib/units';
import type { ResinKitListResponse } from '@/lib/data/resin-kits';

type Row = ResinKitListResponse['items'][number];

const columnsFor = (units: UnitSystem): ColumnDef<Row, unknown>[] => [
  recordColumn({ id: 'lot', header: 'Lot', href: (id) => `/admin/resin-kits/${id}`, text: (r) => r.lot }),
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
}: ListTableProps<Row> & {
  units: UnitSystem;
}) {
  return <ListTable caption="Resin kits" columns={columnsFor(units)} list={list} sort={sort} dir={dir} />;
}
