import 'server-only';
import { QueryTypes } from 'sequelize';
import { sequelize } from '@/lib/data/db';

// Insights read weeks of installs; the office opens and re-opens them, several people at once. A result is kept
// for a short while and served again only while the company's data is provably the same: no event stored
// (the company's largest event seq) and no install derived (its latest derived_at) since. What no event marks —
// time passing an inflate-by, a crew or packer edited — shows within CACHE_MS. Concurrent misses share one query.
// Each app server keeps its own cache (nothing to share: a miss is just the query).

export const INSIGHTS_CACHE_MS = 15_000;
const MAX_ENTRIES = 500;

type Entry<T> = { token: string; storedAt: number; value: Promise<T> };
const entries = new Map<string, Entry<unknown>>();

/** The company's data version: two index probes (install_events (company_id, seq), installs (company_id, derived_at)). */
async function tokenOf(companyId: string): Promise<string> {
  const [row] = await sequelize.query<{ seq: string | null; derived: Date | null }>(
    `SELECT (SELECT max(seq) FROM install_events WHERE company_id = :companyId) AS seq,
            (SELECT max(derived_at) FROM installs WHERE company_id = :companyId) AS derived`,
    { type: QueryTypes.SELECT, replacements: { companyId } },
  );
  return `${row?.seq ?? ''}|${row?.derived ? new Date(row.derived).getTime() : ''}`;
}

/** `compute()`'s answer for `key` of `companyId`, from the cache while the company's data has not changed. */
export async function cachedForCompany<T>(
  companyId: string,
  key: string,
  compute: () => Promise<T>,
  nowMs = Date.now(),
): Promise<T> {
  const token = await tokenOf(companyId);
  const fullKey = `${companyId}|${key}`;
  const entry = entries.get(fullKey) as Entry<T> | undefined;
  if (entry && entry.token === token && nowMs - entry.storedAt < INSIGHTS_CACHE_MS) return entry.value;
  const value = compute();
  entries.set(fullKey, { token, storedAt: nowMs, value });
  // A failed computation is not kept: the next request tries again.
  value.catch(() => {
    if (entries.get(fullKey)?.value === value) entries.delete(fullKey);
  });
  if (entries.size > MAX_ENTRIES) entries.delete(entries.keys().next().value!);
  return value;
}
