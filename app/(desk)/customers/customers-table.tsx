'use client';

import type { ColumnDef } from '@tanstack/react-table';
import { recordColumn } from '@/components/desk/columns';
import { ListTable, type ListTableProps } from '@/components/ui/data-table';
import { label } from '@/lib/domain/vocabulary';
import type { CustomerListResponse } from '@/lib/data/customers';

type Row = CustomerListResponse['items'][number];

const columns: ColumnDef<Row, unknown>[] = [
  recordColumn({ id: 'name', header: 'Customer', href: (id) => `/customers/${id}`, text: (r) => r.name }),
  { id: 'kind', header: 'Kind', enableSorting: true, cell: ({ row }) => label(row.original.kind) },
  { id: 'contact', header: 'Contact', cell: ({ row }) => row.original.contactName ?? '—' },
  { id: 'email', header: 'E-mail', cell: ({ row }) => row.original.email ?? '—' },
  { id: 'phone', header: 'Phone', cell: ({ row }) => row.original.phone ?? '—' },
];

export function CustomersTable({ list, sort, dir }: ListTableProps<Row>) {
  return <ListTable caption="Customers" columns={columns} list={list} sort={sort} dir={dir} />;
}
