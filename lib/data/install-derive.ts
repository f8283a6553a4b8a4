import 'server-only';
import { QueryTypes, type Transaction } from 'sequelize';
import { Install, InstallEvent, Packer, ResinKit, ResinSystem, sequelize } from '@/models';
import type { SessionUser } from '@/lib/auth/session';
import { resinClockSpec } from '@/lib/cure';
import {
  deriveRow,
  emptyStoredFold,
  foldOfState,
  type DeriveMaterials,
  type DeriveSettings,
  type DerivedColumns,
  type StoredFold,
} from '@/lib/install/derived';
import { deriveInstallState, type InstallConditions, type InstallState } from '@/lib/install/state';
import type { UnitSystem } from '@/lib/units';
import { CLOSED_INSTALL_STATUSES } from '@/lib/install/record-rules';

// The install's derived state on its row (migrations 20261203001000 and 20261203011000). The tap folds its one
// event in (lib/data/install-events.ts); a correction, a tap out of log order, and a row never derived (made
// before this existed, or by a seed) re-derive from the whole log here. Readers call `ensureDerived` first.

/** What the clock reads of the company's settings. */
export type CompanySettings = { workingWindowSafetyMargin: number; holdReserve: number; unitSystem: string };

export const settingsOf = (company: CompanySettings): DeriveSettings => ({
  safetyMargin: company.workingWindowSafetyMargin,
  holdReserve: company.holdReserve,
  unitSystem: company.unitSystem as UnitSystem,
});

/** The install's company's settings as one JSON column of a read of its row (alias `install`); numbers as numbers. */
export const companySettingsSql = (install: string) => `(SELECT json_build_object('timeZone', c.time_zone,
  'unitSystem', c.unit_system, 'workingWindowSafetyMargin', c.working_window_safety_margin::float8,
  'holdReserve', c.hold_reserve::float8) FROM companies c WHERE c.id = ${install}."company_id")`;

/** The kit, its resin system and the packer of recorded conditions, as the flags need them (null when unknown). */
export async function loadMaterials(companyId: string, conditions: InstallConditions | null, t?: Transaction) {
  if (!conditions)
    return { kit: null, materials: { resin: null, packer: null, resinKitExpiresOn: null } satisfies DeriveMaterials };
  const [kit, packer] = await Promise.all([
    ResinKit.findOne({
      where: { id: conditions.resinKitId, companyId },
      attributes: ['id', 'resinSystemId', 'expiresOn'],
      include: [{ model: ResinSystem, as: 'resinSystem' }],
      transaction: t,
    }),
    Packer.findOne({
      where: { id: conditions.packerId, companyId },
      attributes: ['minPressureKpa', 'maxPressureKpa'],
      transaction: t,
    }),
  ]);
  const resin = (kit as (ResinKit & { resinSystem?: ResinSystem }) | null)?.resinSystem;
  const materials: DeriveMaterials = {
    resin: resin ? resinClockSpec(resin) : null,
    packer: packer ? { minPressureKpa: packer.minPressureKpa, maxPressureKpa: packer.maxPressureKpa } : null,
    resinKitExpiresOn: kit?.expiresOn ?? null,
  };
  return { kit: kit ? { id: kit.id, resinSystemId: kit.resinSystemId } : null, materials };
}

export type Rederived = {
  state: InstallState;
  fold: StoredFold;
  columns: DerivedColumns;
  eventCount: number;
  kit: { id: string; resinSystemId: string } | null;
};

/** The install's state from its whole log (corrections applied), with its row's derived columns. */
export async function rederive(
  companyId: string,
  installId: string,
  settings: DeriveSettings,
  t: Transaction,
): Promise<Rederived> {
  const events = await InstallEvent.findAll({ where: { installId, companyId }, transaction: t });
  const state = deriveInstallState(events.map((e) => e.get({ plain: true })));
  const { kit, materials } = await loadMaterials(companyId, state.conditions, t);
  const { columns, fold } = deriveRow(foldOfState(state, materials), settings);
  return { state, fold, columns, eventCount: events.length, kit };
}

/** The derived columns of an install with no events. */
export function emptyDerived(settings: DeriveSettings) {
  const { columns, fold } = deriveRow(emptyStoredFold(), settings);
  return { ...columns, eventCount: 0, derivedFold: fold, derivedAt: new Date() };
}

/**
 * Derives every install of the caller's company not derived yet (a seeded or older row), each in its own short
 * transaction under the row's lock. Cheap when there is none: one read of a partial index.
 */
export async function ensureDerived(user: Pick<SessionUser, 'companyId'>, settings: DeriveSettings, limit = 2000) {
  const rows = await sequelize.query<{ id: string }>(
    'SELECT id FROM installs WHERE company_id = :companyId AND derived_at IS NULL LIMIT :limit',
    { replacements: { companyId: user.companyId, limit }, type: QueryTypes.SELECT },
  );
  for (const { id } of rows) {
    await sequelize.transaction(async (t) => {
      const install = await Install.findOne({
        where: { id, companyId: user.companyId },
        lock: t.LOCK.UPDATE,
        transaction: t,
      });
      if (!install || install.derivedAt !== null) return;
      const derived = await rederive(user.companyId, id, settings, t);
      await install.update(rowOf(derived), { transaction: t });
    });
  }
  return rows.length;
}

/** The company's settings that `settingsOf` hands the clock: an edit of one of them re-derives the open installs. */
export const CLOCK_SETTINGS = ['workingWindowSafetyMargin', 'holdReserve', 'unitSystem'] as const;

const STALE_COLUMN = { resinSystemId: 'resin_system_id', resinKitId: 'resin_kit_id', packerId: 'packer_id' } as const;

/** What an edit changed that installs' stored state was derived from: one material, or the company's settings. */
export type DerivedFrom = { column: keyof typeof STALE_COLUMN; id: string } | 'companySettings';

/**
 * An edit of what the clock and the flags read (a resin system's data sheet, a kit's expiry, a packer's rating, the
 * company's margins) leaves the stored state of the open installs that read it stale, while their screen already
 * computes with the new values. In the edit's transaction they are marked underived; their next read
 * (`ensureDerived`) or tap derives them again from the log. Approved and abandoned installs keep the state they were
 * closed with. Returns how many were marked.
 */
export async function markDerivedStale(companyId: string, from: DerivedFrom, t: Transaction): Promise<number> {
  const which = from === 'companySettings' ? '' : `AND ${STALE_COLUMN[from.column]} = :id`;
  const [, affected] = await sequelize.query(
    // Rows locked in id order: two edits marking overlapping installs at once wait for each other, never deadlock.
    `UPDATE installs SET derived_at = NULL, updated_at = now() WHERE id IN (
       SELECT id FROM installs
        WHERE company_id = :companyId AND derived_at IS NOT NULL AND status NOT IN (:closed) ${which}
        ORDER BY id FOR UPDATE)`,
    {
      replacements: {
        companyId,
        id: from === 'companySettings' ? null : from.id,
        closed: [...CLOSED_INSTALL_STATUSES],
      },
      transaction: t,
      type: QueryTypes.UPDATE,
    },
  );
  return affected;
}

/** The columns a re-derivation writes. */
export const rowOf = (derived: Rederived) => ({
  ...derived.columns,
  eventCount: derived.eventCount,
  derivedFold: derived.fold,
  derivedAt: new Date(),
});

/**
 * SQL over an `installs` row (alias `i`) and its kit (alias `k`, `LEFT JOIN resin_kits k ON k.id = i.resin_kit_id`):
 * the flags that time passing raises, which the stored columns cannot hold. Both are critical.
 * - late-inflate: mixed, not inflated, and the inflate-by time has passed;
 * - expired-resin: not mixed yet and the kit's last day (read in UTC, as lib/cure/expiry.ts) is before today.
 */
export const lateInflateNowSql = (i = 'i') =>
  `(${i}.mixed_at IS NOT NULL AND ${i}.inflated_at IS NULL AND ${i}.inflate_by < now())`;
export const expiredNowSql = (i = 'i', k = 'k') =>
  `(${i}.mixed_at IS NULL AND (${i}.derived_fold->>'clockOk')::boolean AND ${k}.expires_on < (now() AT TIME ZONE 'UTC')::date)`;

/** 2 when any flag is critical now, 1 for warnings only, 0 for a clean install (as `worstRank`). */
export const severityRankSql = (i = 'i', k = 'k') =>
  `(CASE WHEN ${i}.worst_severity = 'critical' OR ${lateInflateNowSql(i)} OR ${expiredNowSql(i, k)} THEN 2 ` +
  `WHEN ${i}.worst_severity = 'warning' THEN 1 ELSE 0 END)`;

/** The install's flag kinds now: the stored ones and those that time passing raised (order not kept). */
export const flagKindsNowSql = (i = 'i', k = 'k') =>
  `(${i}.flag_kinds` +
  ` || CASE WHEN ${lateInflateNowSql(i)} THEN ARRAY['late-inflate']::varchar(32)[] ELSE ARRAY[]::varchar(32)[] END` +
  ` || CASE WHEN ${expiredNowSql(i, k)} THEN ARRAY['expired-resin']::varchar(32)[] ELSE ARRAY[]::varchar(32)[] END)`;
