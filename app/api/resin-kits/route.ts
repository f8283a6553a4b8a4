import { createResinKit, listResinKits } from '@/lib/data/resin-kits';
import { settingsCollection } from '@/lib/server/settings-routes';
import { resinKitInputSchema, resinKitListQuerySchema } from '@/lib/validation/resin-kits';

/** Resin kits (lots): `?resinSystemId=&expired=true|false&sort=expiresOn|lot|…`; POST for admins (409 on a lot already listed). */
const routes = settingsCollection({
  csvName: 'resin-kits',
  querySchema: resinKitListQuerySchema,
  inputSchema: resinKitInputSchema,
  list: listResinKits,
  create: createResinKit,
  csv: [
    { header: 'Lot', value: (k) => k.lot },
    { header: 'Resin system', value: (k) => k.resinSystem.name },
    { header: 'Expires on', value: (k) => k.expiresOn },
    { header: 'Expired', value: (k) => (k.expired ? 'yes' : 'no') },
    { header: 'Quantity L', value: (k) => k.quantityL },
    { header: 'Received on', value: (k) => k.receivedOn },
    { header: 'Notes', value: (k) => k.notes },
    { header: 'Archived', value: (k) => (k.archivedAt ? 'yes' : 'no') },
  ],
});
export const GET = routes.GET;
export const POST = routes.POST;
