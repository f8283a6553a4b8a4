import 'server-only';
import { QueryTypes } from 'sequelize';
import { sequelize } from '@/lib/data/db';

// Insights and the review list by severity are read again and again, by several people at once, over data that
// changes only when someone records something. A result is kept for a short while (`ttlMs`) and served again only
// while the company's installs are provably the same: no event stored (the company's largest event seq) and no
// install row written (its latest updated_at; the tap, the derivation, review decisions and edits all set it)
// since. What writes no install row — time passing an inflate-by, a job or crew renamed — shows within `ttlMs`.
// Concurrent misses share one computation. Each app server keeps its own entries (a miss is just the query).

const MAX_ENTRIES = 500;

type Entry<T> = { token: string; storedAt: number; value: Promise<T> };
const entries = new Map<string, Entry<unknown>>();

/** The company's data version: two index probes (install_events (company_id, seq), installs (company_id, updated_at)). */
async function tokenOf(companyId: string): Promise<string> {
  const [row] = await sequelize.query<{ seq: string | null; changed: Date | null }>(
    `SELECT (SELECT max(seq) FROM install_events WHERE company_id = :companyId) AS seq,
            (SELECT max(updated_at) FROM installs WHERE company_id = :companyId) AS changed`,
    { type: QueryTypes.SELECT, replacements: { companyId } },
  );
  return `${row?.seq ?? ''}|${row?.changed ? new Date(row.changed).getTime() : ''}`;
}

/** `compute()`'s answer for `key` of `companyId`, from the cache while the company's installs have not changed. */
export async function cachedForCompany<T>(
  companyId: string,
  key: string,
  ttlMs: number,
  compute: () => Promise<T>,
  nowMs = Date.now(),
): Promise<T> {
  const token = await tokenOf(companyId);
  const fullKey = `${companyId}|${key}`;
  const entry = entries.get(fullKey) as Entry<T> | undefined;
  if (entry && entry.token === token && nowMs - entry.storedAt < ttlMs) return entry.value;
  const value = compute();
  entries.set(fullKey, { token, storedAt: nowMs, value });
  // A failed computation is not kept: the next request tries again.
  value.catch(() => {
    if (entries.get(fullKey)?.value === value) entries.delete(fullKey);
  });
  if (entries.size > MAX_ENTRIES) entries.delete(entries.keys().next().value!);
  return value;
}
