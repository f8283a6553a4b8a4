import { createPacker, listPackers } from '@/lib/data/packers';
import { settingsCollection } from '@/lib/server/settings-routes';
import { packerInputSchema, packerListQuerySchema } from '@/lib/validation/packers';

const routes = settingsCollection({
  csvName: 'packers',
  querySchema: packerListQuerySchema,
  inputSchema: packerInputSchema,
  list: listPackers,
  create: createPacker,
  csv: [
    { header: 'Name', value: (p) => p.name },
    { header: 'Serial', value: (p) => p.serial },
    { header: 'Min pipe mm', value: (p) => p.minDiameterMm },
    { header: 'Max pipe mm', value: (p) => p.maxDiameterMm },
    { header: 'Bladder mm', value: (p) => p.bladderLengthMm },
    { header: 'End margin mm', value: (p) => p.endMarginMm },
    { header: 'Min kPa', value: (p) => p.minPressureKpa },
    { header: 'Max kPa', value: (p) => p.maxPressureKpa },
    { header: 'Archived', value: (p) => (p.archivedAt ? 'yes' : 'no') },
  ],
});
export const GET = routes.GET;
export const POST = routes.POST;
