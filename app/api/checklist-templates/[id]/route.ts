import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import {
  archiveChecklistTemplate,
  getChecklistTemplate,
  updateChecklistTemplate,
} from '@/lib/data/checklist-templates';
import { recordItem } from '@/lib/routes/records';
import { checklistTemplatePatchSchema } from '@/lib/validation/checklist-templates';

/** PATCH with `items` replaces the whole ordered list; items keep the ids they come with. */
const routes = recordItem({
  kind: 'checklistTemplate',
  what: 'Check-list template',
  patchSchema: checklistTemplatePatchSchema,
  get: getChecklistTemplate,
  update: updateChecklistTemplate,
  archive: archiveChecklistTemplate,
  writers: ADMIN_ONLY,
});
export const GET = routes.GET;
export const PATCH = routes.PATCH;
/** Makes a template past installs used inactive, deletes an unused one. */
export const DELETE = routes.DELETE;
