import { archiveChecklistTemplate, getChecklistTemplate, updateChecklistTemplate } from '@/lib/data/checklist-templates';
import { settingsRecord } from '@/lib/server/settings-routes';
import { checklistTemplatePatchSchema } from '@/lib/validation/checklist-templates';

/** PATCH with `items` replaces the whole ordered list; items keep the ids they come with. */
const routes = settingsRecord({ kind: 'checklistTemplate', what: 'Check-list template', patchSchema: checklistTemplatePatchSchema, get: getChecklistTemplate, update: updateChecklistTemplate, archive: archiveChecklistTemplate });
export const GET = routes.GET;
export const PATCH = routes.PATCH;
/** Makes a template past installs used inactive, deletes an unused one. */
export const DELETE = routes.DELETE;
