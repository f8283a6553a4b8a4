import { createCrew, listCrews } from '@/lib/data/crews';
import { recordCollection } from '@/lib/routes/records';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { crewInputSchema, crewListQuerySchema } from '@/lib/validation/crews';

/** Desk roles: every crew of the company; field roles: only their own crews. `?format=csv` exports. */
const routes = recordCollection({
  csvName: 'crews',
  writers: ADMIN_ONLY,
  querySchema: crewListQuerySchema,
  inputSchema: crewInputSchema,
  list: listCrews,
  create: createCrew,
  csv: [
    { header: 'Name', value: (c) => c.name },
    { header: 'Jobs per day', value: (c) => c.dailyCapacity },
    { header: 'Members', value: (c) => c.members.map((m) => m.name).join('; ') },
    { header: 'Archived', value: (c) => (c.archivedAt ? 'yes' : 'no') },
  ],
});
export const GET = routes.GET;
export const POST = routes.POST;
