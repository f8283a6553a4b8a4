import { DESK_ROLES, FIELD_ROLES, type Role, ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { REVIEW_COUNT_URL } from '@/lib/review/queue';

// The one source of the desk and field navigation: plain data (href, label, who sees it) so the labels can
// become message keys. Showing an item is convenience only: every page and handler checks the role again.

export type NavItem = {
  href: string;
  /** The label's key in the `nav` message namespace (also names the count's test id). */
  key: string;
  /** The English label, for reading this list. */
  label: string;
  /** Who sees the item. */
  roles: readonly Role[];
  /** A list API whose `total` is shown beside the label. */
  countUrl?: string;
};

export const deskNav: NavItem[] = [
  { href: '/jobs', key: 'jobs', label: 'Jobs', roles: DESK_ROLES },
  { href: '/repairs', key: 'repairs', label: 'Repairs', roles: DESK_ROLES },
  { href: '/customers', key: 'customers', label: 'Customers', roles: DESK_ROLES },
  { href: '/sites', key: 'sites', label: 'Sites', roles: DESK_ROLES },
  { href: '/schedule', key: 'schedule', label: 'Schedule', roles: DESK_ROLES },
  { href: '/live', key: 'live', label: 'Live', roles: DESK_ROLES },
  { href: '/reviews', key: 'review', label: 'Review', roles: DESK_ROLES, countUrl: REVIEW_COUNT_URL },
  { href: '/invoices', key: 'invoices', label: 'Invoices', roles: DESK_ROLES },
  { href: '/insights', key: 'insights', label: 'Insights', roles: DESK_ROLES },
  { href: '/admin', key: 'company', label: 'Company', roles: ADMIN_ONLY },
];

export const fieldNav: NavItem[] = [{ href: '/today', key: 'today', label: 'Today', roles: FIELD_ROLES }];

/** The items of a navigation list the role sees, in order. */
export function navFor(items: NavItem[], role: Role) {
  return items.filter((item) => item.roles.includes(role));
}
