'use client';

import type { ColumnDef } from '@tanstack/react-table';
import Link from 'next/link';
import type { InstallListResponse } from '@/lib/data/install-list';
import { FlagBadges } from '@/components/review/flag-badges';
import { StatusBadge } from '@/components/ui/badge';
import { ListTable, type ListTableProps } from '@/components/ui/data-table';
import { formatInZone } from '@/lib/time/dates';
import { label } from '@/lib/domain/vocabulary';
import { formatLength, type UnitSystem } from '@/lib/units';

type Row = InstallListResponse['items'][number];

function columnsFor(timeZone: string, unitSystem: UnitSystem): ColumnDef<Row, unknown>[] {
  return [
    {
      id: 'severity',
      header: 'Flags',
      enableSorting: true,
      cell: ({ row }) => <FlagBadges flags={row.original.flags} />,
    },
    {
      id: 'job',
      header: 'Job',
      cell: ({ row }) => (
        <Link
          href={`/reviews/${row.original.id}`}
          className="font-semibold text-brand-700 hover:underline"
          aria-label={`Review job ${row.original.job.number}, repair ${row.original.repair.position}`}
        >
          {row.original.job.number}
        </Link>
      ),
    },
    { id: 'customer', header: 'Customer', cell: ({ row }) => row.original.customer.name },
    { id: 'site', header: 'Site', cell: ({ row }) => `${row.original.site.addressLine}, ${row.original.site.city}` },
    {
      id: 'repair',
      header: 'Repair',
      cell: ({ row }) => {
        const r = row.original.repair;
        return `#${r.position} · ${label(r.defectType)} at ${formatLength(r.distanceMm, unitSystem, 'long')}${
          r.accessPointLabel ? ` from ` + `${r.accessPointLabel}` : ''
        }`;
      },
    },
    { id: 'crew', header: 'Crew', cell: ({ row }) => row.original.crew?.name ?? '—' },
    {
      id: 'finishedAt',
      header: 'Finished',
      enableSorting: true,
      cell: ({ row }) => (row.original.finishedAt ? formatInZone(row.original.finishedAt, timeZone) : '—'),
    },
    { id: 'status', header: 'Status', cell: ({ row }) => <StatusBadge status={row.original.status} /> },
  ];
}

export function ReviewsTable({
  list,
  sort,
  dir,
  timeZone,
  unitSystem,
}: ListTableProps<Row> & {
  timeZone: string;
  unitSystem: UnitSystem;
}) {
  return (
    <ListTable
      caption="Installs to review"
      columns={columnsFor(timeZone, unitSystem)}
      list={list}
      sort={sort}
      dir={dir}
    />
  );
}
