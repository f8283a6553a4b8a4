import { createResinSystem, listResinSystems } from '@/lib/data/resin-systems';
import { label, ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { recordCollection } from '@/lib/routes/records';
import { resinSystemInputSchema, resinSystemListQuerySchema } from '@/lib/validation/resin-systems';

/** Resin systems: a page (or `?format=csv`) for any signed-in user of the company; POST for admins. SI throughout. */
const routes = recordCollection({
  csvName: 'resin-systems',
  writers: ADMIN_ONLY,
  querySchema: resinSystemListQuerySchema,
  inputSchema: resinSystemInputSchema,
  list: listResinSystems,
  create: createResinSystem,
  csv: [
    { header: 'Name', value: (r) => r.name },
    { header: 'Chemistry', value: (r) => label(r.chemistry) },
    { header: 'Reference °C', value: (r) => r.refTempC },
    { header: 'Pot life min', value: (r) => r.potLifeMin },
    { header: 'Hold min', value: (r) => r.holdMin },
    { header: 'Full cure min', value: (r) => r.fullCureMin },
    { header: 'Min °C', value: (r) => r.minTempC },
    { header: 'Max °C', value: (r) => r.maxTempC },
    { header: 'Sensitivity', value: (r) => r.sensitivityKind },
    { header: 'Doubling step °C', value: (r) => r.doublingC },
    { header: 'Activation energy kJ/mol', value: (r) => r.activationEnergyKj },
    { header: 'Archived', value: (r) => (r.archivedAt ? 'yes' : 'no') },
  ],
});
export const GET = routes.GET;
export const POST = routes.POST;
