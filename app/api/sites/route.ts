import { createSite, listSites } from '@/lib/data/sites';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { recordCollection } from '@/lib/routes/records';
import { siteInputSchema, siteListQuerySchema } from '@/lib/validation/sites';

// GET: A page of sites, or with `?format=csv` every site the same filter matches.
// POST: A new site for one of the caller's customers (422 on customerId when it is not theirs).
const routes = recordCollection({
  csvName: 'sites',
  writers: DESK_ROLES,
  querySchema: siteListQuerySchema,
  inputSchema: siteInputSchema,
  list: listSites,
  create: createSite,
  csv: [
    { header: 'Site', value: (s) => s.name },
    { header: 'Customer', value: (s) => s.customer?.name },
    { header: 'Street address', value: (s) => s.addressLine },
    { header: 'City', value: (s) => s.city },
    { header: 'Region', value: (s) => s.region },
    { header: 'Postal code', value: (s) => s.postalCode },
    { header: 'Archived', value: (s) => (s.archivedAt ? 'yes' : 'no') },
  ],
});
export const GET = routes.GET;
export const POST = routes.POST;
