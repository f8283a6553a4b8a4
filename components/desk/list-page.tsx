import type { ReactNode } from 'react';
import { FilterSelect, ListToolbar, exportHrefOf } from '@/components/desk/list-toolbar';
import { PageHeader, type BackLink } from '@/components/ui/page-header';

/**
 * A desk list page: its PageHeader (and an `intro` under it), the ListToolbar (search, the list's `filters`, then the archived filter when
 * `archived` is given, "Export CSV" of `exportApi` with the page's `params`, the "New" button) and the list.
 */
export function ListPage({
  title,
  back,
  description,
  intro,
  search,
  placeholder,
  exportApi,
  params,
  newHref,
  newLabel,
  filters,
  archived,
  children,
}: {
  title: string;
  back?: BackLink;
  description?: ReactNode;
  intro?: ReactNode;
  search?: string;
  placeholder: string;
  exportApi: string;
  params: Record<string, string | string[] | undefined>;
  newHref?: string;
  newLabel?: string;
  filters?: ReactNode;
  archived?: { value: 'true' | 'false' | 'only'; word?: string };
  children: ReactNode;
}) {
  return (
    <div className="space-y-4">
      <PageHeader back={back} title={title} description={description} />
      {intro}
      <ListToolbar
        search={search}
        placeholder={placeholder}
        exportHref={exportHrefOf(exportApi, params)}
        newHref={newHref}
        newLabel={newLabel}
      >
        {filters}
        {archived && <ArchivedFilter {...archived} />}
      </ListToolbar>
      {children}
    </div>
  );
}

/** The "Archived" filter of a list (`word` names what archiving is called there: a check-list is "inactive"). */
export function ArchivedFilter({ value, word = 'archived' }: { value: 'true' | 'false' | 'only'; word?: string }) {
  return (
    <FilterSelect
      name="archived"
      label={word.charAt(0).toUpperCase() + word.slice(1)}
      value={value === 'false' ? '' : value}
      options={[
        { value: 'true', label: `Include ${word}` },
        { value: 'only', label: `Only ${word}` },
      ]}
    />
  );
}
