'use client';

import type { ColumnDef } from '@tanstack/react-table';
import Link from 'next/link';
import { recordColumn } from '@/components/desk/columns';
import { ListTable, type ListTableProps } from '@/components/ui/data-table';
import type { SiteListResponse } from '@/lib/data/sites';

type Row = SiteListResponse['items'][number];

const columns: ColumnDef<Row, unknown>[] = [
  recordColumn({ id: 'name', header: 'Site', href: (id) => `/sites/${id}`, text: (r) => r.name }),
  {
    id: 'customer',
    header: 'Customer',
    cell: ({ row }) =>
      row.original.customer ? (
        <Link href={`/customers/${row.original.customer.id}`} className="hover:underline">
          {row.original.customer.name}
        </Link>
      ) : (
        '—'
      ),
  },
  { id: 'address', header: 'Street address', cell: ({ row }) => row.original.addressLine },
  { id: 'city', header: 'City', enableSorting: true, cell: ({ row }) => row.original.city },
  { id: 'postalCode', header: 'Postal code', cell: ({ row }) => row.original.postalCode ?? '—' },
];

export function SitesTable({ list, sort, dir }: ListTableProps<Row>) {
  return <ListTable caption="Sites" columns={columns} list={list} sort={sort} dir={dir} />;
}
