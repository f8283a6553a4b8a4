'use client';

import type { ColumnDef } from '@tanstack/react-table';
import Link from 'next/link';
import { ListTable, type ListTableProps } from '@/components/ui/data-table';
import { Badge } from '@/components/ui/badge';
import { label } from '@/lib/domain/vocabulary';
import type { UserListResponse } from '@/lib/data/users';
import { UserActions } from './user-actions';

type Row = UserListResponse['items'][number];

export function UsersTable({
  list,
  sort,
  dir,
  selfId,
}: ListTableProps<Row> & {
  selfId: string;
}) {
  const columns: ColumnDef<Row, unknown>[] = [
    {
      id: 'name',
      header: 'Name',
      enableSorting: true,
      cell: ({ row }) => (
        <Link href={`/admin/users/${row.original.id}`} className="font-semibold text-brand-700 hover:underline">
          {row.original.name}
          {row.original.id === selfId && <span className="ml-2 text-xs font-normal text-slate-500">(you)</span>}
        </Link>
      ),
    },
    { id: 'email', header: 'E-mail', enableSorting: true, cell: ({ row }) => row.original.email },
    { id: 'role', header: 'Role', enableSorting: true, cell: ({ row }) => label(row.original.role) },
    {
      id: 'status',
      header: 'Status',
      cell: ({ row }) =>
        row.original.active ? <Badge tone="safe">Active</Badge> : <Badge tone="missed">Deactivated</Badge>,
    },
    {
      id: 'actions',
      header: 'Actions',
      cell: ({ row }) => <UserActions user={row.original} isSelf={row.original.id === selfId} />,
    },
  ];
  return <ListTable caption="Users" columns={columns} list={list} sort={sort} dir={dir} />;
}
