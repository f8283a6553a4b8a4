// @vitest-environment jsdom
import type { ColumnDef } from '@tanstack/react-table';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { useState } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { DataTable } from '@/components/ui/data-table';
import { IntlWrapper } from '../i18n/intl';

vi.mock('next/navigation', () => ({
  useRouter: () => ({ push: vi.fn(), refresh: vi.fn() }),
  usePathname: () => '/admin/users',
  useSearchParams: () => new URLSearchParams(),
}));

afterEach(() => cleanup());

type Row = { id: string; name: string };

/** A row action with its own state, like UserActions' "… is deactivated and signed out." message. */
function Action({ name }: { name: string }) {
  const [said, setSaid] = useState('');
  return (
    <button type="button" onClick={() => setSaid(`${name} done`)}>
      {said || `Act on ${name}`}
    </button>
  );
}

// As the desk tables do: the columns are built anew on every render.
function Table({ tick }: { tick: number }) {
  const columns: ColumnDef<Row, unknown>[] = [
    { id: 'name', header: 'Name', cell: ({ row }) => `${row.original.name} (${tick})` },
    { id: 'actions', header: 'Actions', cell: ({ row }) => <Action name={row.original.name} /> },
  ];
  return (
    <DataTable caption="People" columns={columns} data={[{ id: '1', name: 'Jo' }]} page={1} pageCount={1} total={1} />
  );
}

describe('DataTable', () => {
  it('keeps a cell’s state when the table re-renders with new column functions (a refresh after an action)', () => {
    const { rerender } = render(<Table tick={1} />, { wrapper: IntlWrapper });
    fireEvent.click(screen.getByRole('button', { name: 'Act on Jo' }));
    expect(screen.getByRole('button', { name: 'Jo done' })).toBeTruthy();
    rerender(<Table tick={2} />);
    expect(screen.getByText('Jo (2)')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Jo done' })).toBeTruthy();
  });
});
