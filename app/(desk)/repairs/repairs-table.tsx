'use client';

import type { ColumnDef } from '@tanstack/react-table';
import Link from 'next/link';
import { ListTable, type ListTableProps } from '@/components/ui/data-table';
import { formatInZone } from '@/lib/time/dates';
import { label } from '@/lib/domain/vocabulary';
import { formatLength, type UnitSystem } from '@/lib/units';
import type { RepairListResponse } from '@/lib/data/repairs';

type Row = RepairListResponse['items'][number];

const columnsFor = (unitSystem: UnitSystem, timeZone: string): ColumnDef<Row, unknown>[] => [
  {
    id: 'job',
    header: 'Job',
    cell: ({ row }) => (
      <Link href={`/jobs/${row.original.job.id}`} className="whitespace-nowrap text-brand-700 hover:underline">
        {row.original.job.number}
      </Link>
    ),
  },
  {
    id: 'position',
    header: 'Repair',
    enableSorting: true,
    cell: ({ row }) => (
      <Link
        href={`/repairs/${row.original.id}`}
        className="whitespace-nowrap font-semibold text-brand-700 hover:underline"
      >
        Repair {row.original.position}
      </Link>
    ),
  },
  { id: 'segment', header: 'Segment', cell: ({ row }) => row.original.segment.label },
  {
    id: 'distanceMm',
    header: 'Distance',
    enableSorting: true,
    cell: ({ row }) => formatLength(row.original.distanceMm, unitSystem, 'long'),
  },
  {
    id: 'defect',
    header: 'Defect',
    cell: ({ row }) => `${label(row.original.defectType)} (${formatLength(row.original.defectLengthMm, unitSystem)})`,
  },
  { id: 'conditionGrade', header: 'Grade', enableSorting: true, cell: ({ row }) => row.original.conditionGrade },
  {
    id: 'patch',
    header: 'Patch',
    cell: ({ row }) =>
      row.original.plannedPatchLengthMm ? formatLength(row.original.plannedPatchLengthMm, unitSystem) : '—',
  },
  { id: 'status', header: 'Status', cell: ({ row }) => label(row.original.status) },
  {
    id: 'createdAt',
    header: 'Added',
    enableSorting: true,
    cell: ({ row }) => formatInZone(row.original.createdAt, timeZone, 'yyyy-MM-dd'),
  },
];

export function RepairsTable({
  list,
  sort,
  dir,
  unitSystem,
  timeZone,
}: ListTableProps<Row> & {
  unitSystem: UnitSystem;
  timeZone: string;
}) {
  return <ListTable caption="Repairs" columns={columnsFor(unitSystem, timeZone)} list={list} sort={sort} dir={dir} />;
}
