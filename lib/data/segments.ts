import 'server-only';
import { Op, type InferAttributes, type Transaction } from 'sequelize';
import type { z } from 'zod';
import { AccessPoint, Customer, Job, Repair, Segment, Site } from '@/models';
import { sequelize } from '@/lib/data/db';
import { recordAudit } from '@/lib/data/audit';
import { AppError, notFound } from '@/lib/server/errors';
import type { SessionUser } from '@/lib/auth/session';
import {
  segmentShapeIssues,
  type SegmentListQuery,
  type segmentInputSchema,
  type segmentPatchSchema,
} from '@/lib/validation/segments';
import { allOf, archivedWhere, pageOf, searchWhere, windowOf } from './list';
import { assertOfficeWriter, crewJobsWhere } from './scope';
import { archiveOrDelete, lockOwnRow, updateAudited } from './records';

const ENTITY = 'segment';

type Plain<T extends Site | Customer | AccessPoint | Segment | Repair | Job> = InferAttributes<T>;
export type SegmentListItem = Plain<Segment> & { site: Pick<Plain<Site>, 'id' | 'name'> | null };
export type SegmentDetail = Plain<Segment> & {
  site: Plain<Site> & { customer: Pick<Plain<Customer>, 'id' | 'name'> | null };
  fromAccessPoint: Plain<AccessPoint>;
  toAccessPoint: Plain<AccessPoint> | null;
  repairs: (Plain<Repair> & { job: Pick<Plain<Job>, 'id' | 'number' | 'status'> | null })[];
};

export type SegmentListResponse = Awaited<ReturnType<typeof listSegments>>;

/** A page of the caller's segments (field users: only those on the sites of their crews' jobs). */
export async function listSegments(user: SessionUser, query: SegmentListQuery, exportAll = false) {
  const where = allOf(
    { companyId: user.companyId },
    archivedWhere(query.archived),
    query.siteId ? { siteId: query.siteId } : undefined,
    searchWhere(query.q, ['label']),
    segmentScope(user),
  );
  const { rows, count } = await Segment.findAndCountAll({
    where,
    include: [{ model: Site, as: 'site', attributes: ['id', 'name'] }],
    order: [
      [query.sort, query.dir.toUpperCase()],
      ['id', 'ASC'],
    ],
    ...windowOf(query, exportAll),
  });
  return pageOf(
    rows.map((row) => row.get({ plain: true }) as SegmentListItem),
    count,
    query,
  );
}

export type SegmentResponse = Awaited<ReturnType<typeof getSegment>>;

/** One segment with its site, both access points and the repairs planned on it. */
export async function getSegment(user: SessionUser, id: string): Promise<SegmentDetail> {
  const segment = await Segment.findOne({
    where: allOf({ id, companyId: user.companyId }, segmentScope(user)),
    include: [
      { model: Site, as: 'site', include: [{ model: Customer, as: 'customer', attributes: ['id', 'name'] }] },
      { model: AccessPoint, as: 'fromAccessPoint' },
      { model: AccessPoint, as: 'toAccessPoint', required: false },
    ],
  });
  if (!segment) throw notFound('Segment');
  // A field user sees only the repairs of their crews' jobs, even on a shared segment.
  const repairs = await Repair.findAll({
    where: allOf({ segmentId: id, companyId: user.companyId }, crewJobsWhere(user, 'job_id', 'id')),
    include: [{ model: Job, as: 'job', attributes: ['id', 'number', 'status'] }],
    order: [
      ['distanceMm', 'ASC'],
      ['position', 'ASC'],
    ],
  });
  return {
    ...(segment.get({ plain: true }) as Omit<SegmentDetail, 'repairs'>),
    repairs: repairs.map((r) => r.get({ plain: true }) as SegmentDetail['repairs'][number]),
  };
}

export async function createSegment(user: SessionUser, input: z.output<typeof segmentInputSchema>) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    const site = await Site.findOne({ where: { id: input.siteId, companyId: user.companyId }, transaction });
    if (!site) throw new AppError(422, 'That site was not found.', { siteId: ['Pick one of your sites'] });
    if (site.archivedAt) throw new AppError(422, 'That site is archived.', { siteId: ['This site is archived'] });
    await assertEndsOnSite(user, input, transaction);
    const segment = await Segment.create({ ...input, companyId: user.companyId }, { transaction });
    await recordAudit(
      user,
      { action: 'create', entityType: ENTITY, entityId: segment.id, changes: input },
      transaction,
    );
    return segment.get({ plain: true });
  });
}

export async function updateSegment(user: SessionUser, id: string, patch: z.output<typeof segmentPatchSchema>) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    const segment = await lockOwnRow(Segment, user, id, 'Segment', transaction);
    const merged = { ...segment.get({ plain: true }), ...definedOf(patch) };
    // The patch alone may be sound while the segment it makes is not (a new nominal size against the old diameter).
    const issues = segmentShapeIssues(merged);
    if (Object.keys(issues).length) throw new AppError(422, Object.values(issues)[0][0], issues);
    await assertEndsOnSite(user, merged, transaction);
    return updateAudited(user, segment, ENTITY, patch, transaction);
  }) as Promise<InferAttributes<Segment>>;
}

/** Archives a segment that repairs are planned on (the repair record needs it) and deletes one without. */
export async function archiveSegment(user: SessionUser, id: string, reason?: string | null) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    const segment = await lockOwnRow(Segment, user, id, 'Segment', transaction);
    const repairs = await Repair.count({ where: { segmentId: id, companyId: user.companyId }, transaction });
    return archiveOrDelete(
      user,
      segment,
      { entityType: ENTITY, inUse: repairs > 0, summary: { siteId: segment.siteId, label: segment.label }, reason },
      transaction,
    );
  });
}

/** Both ends must be access points of the segment's own site (of the caller's company): 422 otherwise. */
async function assertEndsOnSite(
  user: SessionUser,
  segment: { siteId: string; fromAccessPointId: string; toAccessPointId?: string | null },
  transaction: Transaction,
) {
  const ids = [segment.fromAccessPointId, segment.toAccessPointId].filter((id): id is string => Boolean(id));
  const found = await AccessPoint.findAll({
    where: { id: { [Op.in]: ids }, siteId: segment.siteId, companyId: user.companyId },
    attributes: ['id'],
    transaction,
  });
  const onSite = new Set(found.map((point) => point.id));
  const fields: Record<string, string[]> = {};
  if (!onSite.has(segment.fromAccessPointId)) fields.fromAccessPointId = ['Pick an access point of this site'];
  if (segment.toAccessPointId && !onSite.has(segment.toAccessPointId))
    fields.toAccessPointId = ['Pick an access point of this site'];
  if (Object.keys(fields).length)
    throw new AppError(422, 'Both ends of a segment must be access points of its site.', fields);
}

const definedOf = <T extends object>(patch: T) =>
  Object.fromEntries(Object.entries(patch).filter(([, value]) => value !== undefined)) as Partial<T>;

/** Field users read only the segments on the sites of their crews' jobs. */
const segmentScope = (user: SessionUser) => crewJobsWhere(user, 'site_id', 'site_id');
