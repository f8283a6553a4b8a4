import { createCustomer, listCustomers } from '@/lib/data/customers';
import { DESK_ROLES, label } from '@/lib/domain/vocabulary';
import { recordCollection } from '@/lib/routes/records';
import { customerInputSchema, customerListQuerySchema } from '@/lib/validation/customers';

/** A page of customers, or with `?format=csv` every customer the same filter matches. */
const routes = recordCollection({
  csvName: 'customers',
  writers: DESK_ROLES,
  querySchema: customerListQuerySchema,
  inputSchema: customerInputSchema,
  list: listCustomers,
  create: createCustomer,
  csv: [
    { header: 'Name', value: (c) => c.name },
    { header: 'Kind', value: (c) => label(c.kind) },
    { header: 'Contact', value: (c) => c.contactName },
    { header: 'E-mail', value: (c) => c.email },
    { header: 'Phone', value: (c) => c.phone },
    { header: 'Billing address', value: (c) => c.billingAddress },
    { header: 'Archived', value: (c) => (c.archivedAt ? 'yes' : 'no') },
  ],
});
export const GET = routes.GET;
export const POST = routes.POST;
