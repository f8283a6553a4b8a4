'use client';

import type { ColumnDef } from '@tanstack/react-table';
import Link from 'next/link';
import { Badge, StatusBadge } from '@/components/ui/badge';
import { ListTable, type ListTableProps } from '@/components/ui/data-table';
import { formatMoney } from '@/lib/invoice/money';
import type { InvoiceListResponse } from '@/lib/data/invoices';

type Row = InvoiceListResponse['items'][number];

const columns: ColumnDef<Row, unknown>[] = [
  {
    id: 'number',
    header: 'Invoice',
    enableSorting: true,
    cell: ({ row }) => <span className="font-semibold">{row.original.number}</span>,
  },
  {
    id: 'job',
    header: 'Job',
    cell: ({ row }) => (
      <Link href={`/jobs/${row.original.jobId}`} className="text-brand-700 hover:underline">
        {row.original.job?.number}
      </Link>
    ),
  },
  { id: 'customer', header: 'Customer', cell: ({ row }) => row.original.job?.customer?.name },
  {
    id: 'status',
    header: 'Status',
    enableSorting: true,
    cell: ({ row }) => (
      <span className="inline-flex flex-wrap items-center gap-1">
        <StatusBadge status={row.original.status} />
        {row.original.paymentAlert && <Badge tone="missed">Payment problem</Badge>}
      </span>
    ),
  },
  {
    id: 'totalCents',
    header: 'Total',
    enableSorting: true,
    cell: ({ row }) => (
      <span className="tabular-nums">{formatMoney(row.original.totalCents, row.original.currency)}</span>
    ),
  },
  { id: 'dueOn', header: 'Due', enableSorting: true, cell: ({ row }) => row.original.dueOn },
];

export function InvoicesTable({ list, sort, dir }: ListTableProps<Row>) {
  return <ListTable caption="Invoices" columns={columns} list={list} sort={sort} dir={dir} />;
}
