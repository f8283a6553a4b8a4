'use client';

import type { ColumnDef } from '@tanstack/react-table';
import Link from 'next/link';
import { DataTable } from '@/components/ui/data-table';
import { label } from '@/lib/domain/vocabulary';
import type { CustomerListResponse } from '@/lib/data/customers';

type Row = CustomerListResponse['items'][number];

const columns: ColumnDef<Row, unknown>[] = [
  {
    id: 'name',
    header: 'Customer',
    enableSorting: true,
    cell: ({ row }) => (
      <Link href={`/customers/${row.original.id}`} className="font-semibold text-brand-700 hover:underline">
        {row.original.name}
        {row.original.archivedAt && <span className="ml-2 text-xs font-normal text-slate-500">(archived)</span>}
      </Link>
    ),
  },
  { id: 'kind', header: 'Kind', enableSorting: true, cell: ({ row }) => label(row.original.kind) },
  { id: 'contact', header: 'Contact', cell: ({ row }) => row.original.contactName ?? '—' },
  { id: 'email', header: 'E-mail', cell: ({ row }) => row.original.email ?? '—' },
  { id: 'phone', header: 'Phone', cell: ({ row }) => row.original.phone ?? '—' },
];

export function CustomersTable({ list, sort, dir }: { list: CustomerListResponse; sort: string; dir: 'asc' | 'desc' }) {
  return (
    <DataTable
      caption="Customers"
      columns={columns}
      data={list.items}
      page={list.page}
      pageCount={list.pageCount}
      total={list.total}
      sort={sort}
      dir={dir}
    />
  );
}
