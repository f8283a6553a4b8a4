import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { createChecklistTemplate, listChecklistTemplates } from '@/lib/data/checklist-templates';
import { recordCollection } from '@/lib/routes/records';
import { checklistTemplateInputSchema, checklistTemplateListQuerySchema } from '@/lib/validation/checklist-templates';

/** Check-list templates with their ordered items `{ id, label, required }`; `archived` filters on inactive ones. */
const routes = recordCollection({
  csvName: 'checklist-templates',
  writers: ADMIN_ONLY,
  querySchema: checklistTemplateListQuerySchema,
  inputSchema: checklistTemplateInputSchema,
  list: listChecklistTemplates,
  create: createChecklistTemplate,
  csv: [
    { header: 'Name', value: (t) => t.name },
    {
      header: 'Items',
      value: (t) => t.items.map((item) => `${item.label}${item.required ? '' : ' (optional)'}`).join(' | '),
    },
    { header: 'Active', value: (t) => (t.active ? 'yes' : 'no') },
  ],
});
export const GET = routes.GET;
export const POST = routes.POST;
