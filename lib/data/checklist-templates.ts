import 'server-only';
import { randomUUID } from 'node:crypto';
import type { Transaction } from 'sequelize';
import type { z } from 'zod';
import { ChecklistTemplate, Install } from '@/models';
import type { ChecklistItem } from '@/models/checklist-template';
import type { SessionUser } from '@/lib/auth/session';
import type {
  ChecklistTemplateInput,
  ChecklistTemplateListQuery,
  checklistTemplatePatchSchema,
} from '@/lib/validation/checklist-templates';
import { allOf, searchWhere } from './list';
import { plainPage, settingsRecord } from './records';

const templates = settingsRecord(ChecklistTemplate, 'checklist_template', 'Check-list template');
const installsOf = (user: SessionUser, checklistTemplateId: string, transaction?: Transaction) =>
  Install.count({ where: { companyId: user.companyId, checklistTemplateId }, transaction });

export type ChecklistTemplateListResponse = Awaited<ReturnType<typeof listChecklistTemplates>>;

/**
 * A page of the company's check-list templates. A template is archived by making it inactive (a new
 * install takes the most recently saved active one), so `archived` filters on `active`.
 */
export async function listChecklistTemplates(user: SessionUser, query: ChecklistTemplateListQuery, exportAll = false) {
  const where = allOf(
    { companyId: user.companyId },
    query.archived === 'true' ? undefined : { active: query.archived === 'false' },
    searchWhere(query.q, ['name']),
  );
  return plainPage(ChecklistTemplate, where, query, exportAll);
}

export type ChecklistTemplateResponse = Awaited<ReturnType<typeof getChecklistTemplate>>;

export async function getChecklistTemplate(user: SessionUser, id: string) {
  const template = await templates.find(user, id);
  return { ...template, installCount: await installsOf(user, id) };
}

export async function createChecklistTemplate(user: SessionUser, input: ChecklistTemplateInput) {
  return templates.create(user, { ...input, items: withIds(input.items) });
}

/** Saves the whole ordered list at once: items that come with an id keep it, new ones get one. */
export async function updateChecklistTemplate(
  user: SessionUser,
  id: string,
  patch: z.output<typeof checklistTemplatePatchSchema>,
) {
  return templates.update(user, id, () => (patch.items ? { ...patch, items: withIds(patch.items) } : patch));
}

/** A template past installs were checked against is made inactive (their answers still name its items); an unused one is deleted. */
export async function archiveChecklistTemplate(user: SessionUser, id: string) {
  return templates.archive(
    user,
    id,
    (transaction) => installsOf(user, id, transaction),
    (row) => ({ values: { active: false }, isArchived: !row.active }),
  );
}

function withIds(items: { id?: string; label: string; required: boolean }[]): ChecklistItem[] {
  return items.map((item) => ({
    id: item.id ?? `item-${randomUUID().slice(0, 8)}`,
    label: item.label,
    required: item.required,
  }));
}
