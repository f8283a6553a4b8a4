import type { ComponentProps, ReactNode } from 'react';

/**
 * A small table that is all on the page (a record's repairs, segments, access points, its event log): the column
 * heads, an optional caption for screen readers, and the rows as children. Sorting and paging lists use DataTable.
 */
export function PlainTable({
  headers,
  caption,
  children,
  className = 'min-w-full rounded-lg bg-white text-sm ring-1 ring-slate-200',
  headClassName = 'bg-slate-100 text-left text-xs uppercase tracking-wide text-slate-600',
  ...props
}: Omit<ComponentProps<'table'>, 'children'> & {
  headers: ReactNode[];
  caption?: string;
  children: ReactNode;
  headClassName?: string;
}) {
  return (
    <table className={className} {...props}>
      {caption && <caption className="sr-only">{caption}</caption>}
      <thead className={headClassName}>
        <tr>
          {headers.map((header, index) => (
            <th key={index} scope="col" className="px-3 py-2">
              {header}
            </th>
          ))}
        </tr>
      </thead>
      <tbody className="divide-y divide-slate-100">{children}</tbody>
    </table>
  );
}
