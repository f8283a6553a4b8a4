import { z } from 'zod';
import { listQuerySchema } from './list';

export const CHECKLIST_ITEM_ID = /^[A-Za-z0-9_-]{1,60}$/;

const itemSchema = z.object({
  // Left out for a new item (the server gives it one); kept for an existing one, so answers already
  // recorded on past installs still match their item.
  id: z.string().regex(CHECKLIST_ITEM_ID, 'Item ids are 1–60 letters, digits, - or _').optional(),
  label: z.string().trim().min(1, 'Say what the crew must check').max(200, 'At most 200 characters'),
  required: z.boolean({ error: 'Say whether the item is required' }),
});

// Project limit: a pre-install check-list longer than 50 items stops being read at the manhole.
const itemsSchema = z
  .array(itemSchema, { error: 'Send the items as a list' })
  .min(1, 'Add at least one item')
  .max(50, 'At most 50 items')
  .superRefine((items, ctx) => {
    const labels = new Map<string, number>();
    const ids = new Set<string>();
    items.forEach((item, index) => {
      const key = item.label.trim().toLowerCase();
      if (labels.has(key))
        ctx.addIssue({ code: 'custom', message: `Same as item ${labels.get(key)! + 1}`, path: [index, 'label'] });
      else labels.set(key, index);
      if (item.id && ids.has(item.id))
        ctx.addIssue({ code: 'custom', message: 'Two items have the same id', path: [index, 'id'] });
      if (item.id) ids.add(item.id);
    });
  });

// No defaults here: a PATCH must leave out what it does not change.
const checklistFields = {
  name: z.string().trim().min(1, 'Name the check-list').max(120, 'At most 120 characters'),
  items: itemsSchema,
  active: z.boolean({ error: 'active is true or false' }),
};

/** A check-list template; POST /api/checklist-templates and the page's form use it. Items are in the crew's order. */
export const checklistTemplateInputSchema = z.object({
  ...checklistFields,
  active: checklistFields.active.default(true),
});
export type ChecklistTemplateInput = z.output<typeof checklistTemplateInputSchema>;
export type ChecklistTemplateFormValues = z.input<typeof checklistTemplateInputSchema>;

export const checklistTemplatePatchSchema = z.object(checklistFields).partial().strict();

export const CHECKLIST_SORT_KEYS = ['name', 'createdAt', 'updatedAt'] as const;
export const checklistTemplateListQuerySchema = listQuerySchema(CHECKLIST_SORT_KEYS, { sort: 'name' });
export type ChecklistTemplateListQuery = z.infer<typeof checklistTemplateListQuerySchema>;
