import 'server-only';
import { randomUUID } from 'node:crypto';
import type { z } from 'zod';
import { ChecklistTemplate, Install } from '@/models';
import type { ChecklistItem } from '@/models/checklist-template';
import { sequelize } from '@/lib/data/db';
import { notFound } from '@/lib/server/errors';
import type { SessionUser } from '@/lib/auth/session';
import type {
  ChecklistTemplateInput,
  ChecklistTemplateListQuery,
  checklistTemplatePatchSchema,
} from '@/lib/validation/checklist-templates';
import { allOf, pageOf, searchWhere, windowOf } from './list';
import { assertAdmin } from './scope';
import { archiveOrDelete, createAudited, lockOwnRow, updateAudited } from './records';

const ENTITY = 'checklist_template';

export type ChecklistTemplateListResponse = Awaited<ReturnType<typeof listChecklistTemplates>>;

/**
 * A page of the company's check-list templates. A template is archived by making it inactive (a new
 * install takes the most recently saved active one), so `archived` filters on `active`.
 */
export async function listChecklistTemplates(user: SessionUser, query: ChecklistTemplateListQuery, exportAll = false) {
  const { rows, count } = await ChecklistTemplate.findAndCountAll({
    where: allOf(
      { companyId: user.companyId },
      query.archived === 'true' ? undefined : { active: query.archived === 'false' },
      searchWhere(query.q, ['name']),
    ),
    order: [
      [query.sort, query.dir.toUpperCase()],
      ['id', 'ASC'],
    ],
    ...windowOf(query, exportAll),
  });
  return pageOf(
    rows.map((row) => row.get({ plain: true })),
    count,
    query,
  );
}

export type ChecklistTemplateResponse = Awaited<ReturnType<typeof getChecklistTemplate>>;

export async function getChecklistTemplate(user: SessionUser, id: string) {
  const row = await ChecklistTemplate.findOne({ where: { id, companyId: user.companyId } });
  if (!row) throw notFound('Check-list template');
  return {
    ...row.get({ plain: true }),
    installCount: await Install.count({ where: { companyId: user.companyId, checklistTemplateId: id } }),
  };
}

export async function createChecklistTemplate(user: SessionUser, input: ChecklistTemplateInput) {
  assertAdmin(user);
  const values = { ...input, items: withIds(input.items) };
  return createAudited(user, ChecklistTemplate, ENTITY, values);
}

/** Saves the whole ordered list at once: items that come with an id keep it, new ones get one. */
export async function updateChecklistTemplate(
  user: SessionUser,
  id: string,
  patch: z.output<typeof checklistTemplatePatchSchema>,
) {
  assertAdmin(user);
  return sequelize.transaction(async (transaction) => {
    const row = await lockOwnRow(ChecklistTemplate, user, id, 'Check-list template', transaction);
    return updateAudited(
      user,
      row,
      ENTITY,
      patch.items ? { ...patch, items: withIds(patch.items) } : patch,
      transaction,
    );
  });
}

/** A template past installs were checked against is made inactive (their answers still name its items); an unused one is deleted. */
export async function archiveChecklistTemplate(user: SessionUser, id: string) {
  assertAdmin(user);
  return sequelize.transaction(async (transaction) => {
    const row = await lockOwnRow(ChecklistTemplate, user, id, 'Check-list template', transaction);
    const installs = await Install.count({
      where: { companyId: user.companyId, checklistTemplateId: id },
      transaction,
    });
    return archiveOrDelete(
      user,
      row,
      {
        entityType: ENTITY,
        inUse: installs > 0,
        summary: { name: row.name },
        archive: { values: { active: false }, isArchived: !row.active },
      },
      transaction,
    );
  });
}

function withIds(items: { id?: string; label: string; required: boolean }[]): ChecklistItem[] {
  return items.map((item) => ({
    id: item.id ?? `item-${randomUUID().slice(0, 8)}`,
    label: item.label,
    required: item.required,
  }));
}
