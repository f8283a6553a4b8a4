// After the soak: what the tablets were told was stored, against what the database holds.
// lost = acknowledged taps with no row; duplicated = rows beyond one per clientEventId. Also checked:
// no row the tablets never sent, each install's rows in the order its tablet sent them (by receive
// time and by device time), a finished install signed off, and its derived summary (once the tap keeps
// one on the row) matching its log.
import pg from 'pg';

export async function verify(databaseUrl, companyId, tablets) {
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    const { rows } = await client.query(
      `SELECT client_event_id AS id, install_id AS "installId", device_time AS "deviceTime", received_at AS "receivedAt"
         FROM install_events WHERE company_id = $1`,
      [companyId],
    );
    const installs = await client.query(`SELECT * FROM installs WHERE company_id = $1`, [companyId]);
    return compare(rows, installs.rows, tablets);
  } finally {
    await client.end();
  }
}

function compare(rows, installs, tablets) {
  const problems = [];
  const sent = tablets.flatMap((t) => t.sent);
  const sentById = new Map(sent.map((entry) => [entry.clientEventId, entry]));
  const countById = new Map();
  for (const row of rows) countById.set(row.id, (countById.get(row.id) ?? 0) + 1);

  const acknowledged = sent.filter((entry) => entry.acknowledged);
  const stored = acknowledged.filter((entry) => countById.has(entry.clientEventId)).length;
  let duplicated = 0;
  for (const count of countById.values()) duplicated += count - 1;
  const unknown = [...countById.keys()].filter((id) => !sentById.has(id));
  if (unknown.length) problems.push(`${unknown.length} stored taps no tablet sent (first ${unknown[0]})`);

  // Per install: the stored rows in receive order (then device order) are exactly what the tablet sent, in its order.
  const rowsByInstall = groupBy(rows, (row) => row.installId);
  const sentByInstall = groupBy(sent, (entry) => entry.installId);
  let outOfOrder = 0;
  for (const [installId, entries] of sentByInstall) {
    const expected = entries
      .filter((e) => countById.has(e.clientEventId))
      .sort((a, b) => a.seq - b.seq)
      .map((e) => e.clientEventId);
    const stored = rowsByInstall.get(installId) ?? [];
    const byReceipt = [...stored].sort((a, b) => a.receivedAt - b.receivedAt).map((r) => r.id);
    const byDevice = [...stored].sort((a, b) => a.deviceTime - b.deviceTime).map((r) => r.id);
    if (!sameList(byReceipt, expected) || !sameList(byDevice, expected)) outOfOrder++;
  }
  if (outOfOrder) problems.push(`${outOfOrder} installs hold their taps in another order than their tablet sent them`);

  // A finished install (its tablet got every tap acknowledged, sign-off last) is awaiting review.
  const finished = tablets.flatMap((t) =>
    [...groupBy(t.sent, (e) => e.installId)].filter(([, list]) => list.every((e) => e.acknowledged)),
  );
  const rowOf = new Map(installs.map((row) => [row.id, row]));
  let notSignedOff = 0;
  let derivedWrong = 0;
  for (const [installId, list] of finished) {
    const install = rowOf.get(installId);
    if (list.length >= 13 && install?.status !== 'awaiting_review') notSignedOff++;
    // The tap's derived columns (filled in the tap's transaction once that lands): they must agree with the log.
    if (install?.derived_at && install.event_count !== (rowsByInstall.get(installId)?.length ?? 0)) derivedWrong++;
    if (install?.derived_at && list.length >= 13 && install.step !== 'done') derivedWrong++;
  }
  if (notSignedOff) problems.push(`${notSignedOff} finished installs are not awaiting review`);
  if (derivedWrong)
    problems.push(`${derivedWrong} installs whose derived summary (step, event count) disagrees with their log`);

  return { stored, lost: acknowledged.length - stored, duplicated, problems };
}

function groupBy(list, key) {
  const map = new Map();
  for (const item of list) {
    const k = key(item);
    if (!map.has(k)) map.set(k, []);
    map.get(k).push(item);
  }
  return map;
}

const sameList = (a, b) => a.length === b.length && a.every((value, i) => value === b[i]);
