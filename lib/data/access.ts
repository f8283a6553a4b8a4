import 'server-only';
import type { Model, ModelStatic, WhereOptions } from 'sequelize';
import type { SessionUser } from '@/lib/auth/session';
import { idOf } from '@/lib/server/http';
import * as models from '@/models';
import { notFound } from '@/lib/server/errors';

// Authorization comes before validation: a handler that reads a body for one row first makes sure the row is
// the caller's company's, so another company's caller gets the same 404 whatever they send (never a 400 that
// tells them their body was wrong for a row they cannot see). The data function checks again when it writes.

const MODELS = {
  accessPoint: models.AccessPoint,
  checklistTemplate: models.ChecklistTemplate,
  crew: models.Crew,
  customer: models.Customer,
  install: models.Install,
  invoice: models.Invoice,
  job: models.Job,
  packer: models.Packer,
  repair: models.Repair,
  resinKit: models.ResinKit,
  resinSystem: models.ResinSystem,
  segment: models.Segment,
  site: models.Site,
  user: models.User,
} as const;

export type OwnRowKind = keyof typeof MODELS;

/** The `[id]` of the route when it names a row of the caller's company; 404 otherwise (malformed ids too). */
export async function ownRowId(
  user: SessionUser,
  kind: OwnRowKind,
  params: Promise<Record<string, string>>,
  what: string,
): Promise<string> {
  const id = await idOf(params, what);
  const model = MODELS[kind] as unknown as ModelStatic<Model>;
  const row = await model
    .unscoped()
    .findOne({ where: { id, companyId: user.companyId } as WhereOptions, attributes: ['id'] });
  if (!row) throw notFound(what);
  return id;
}
