import { randomUUID } from 'node:crypto';
import { POST as createInstallRoute } from '@/app/api/installs/route';
import { GET as getInstallRoute } from '@/app/api/installs/[id]/route';
import { POST as postEventRoute } from '@/app/api/installs/[id]/events/route';
import type { InstallEventType } from '@/lib/domain/vocabulary';
import { call } from './call';
import type { InstallWorld } from './world';

const json = (body: unknown): RequestInit => ({
  method: 'POST',
  body: JSON.stringify(body),
  headers: { 'content-type': 'application/json' },
});

export const createInstall = (body: unknown) => call(createInstallRoute, '/api/installs', {}, json(body));
export const getInstall = (id: string) => call(getInstallRoute, `/api/installs/${id}`, { id });
export const postEvent = (installId: string, body: unknown) =>
  call(postEventRoute, `/api/installs/${installId}/events`, { id: installId }, json(body));

/** Starts an install of the world's repair as whoever is signed in; returns its id. */
export async function startInstall(w: InstallWorld) {
  const id = randomUUID();
  const { status, body } = await createInstall({ id, repairId: w.repair.id });
  if (status !== 201) throw new Error(`create install answered ${status}: ${JSON.stringify(body)}`);
  return id;
}

/** Device times a few hours back, so the clock's deadlines are all in the past by now. */
export const T0 = Date.now() - 5 * 3600_000;
export const at = (min: number) => new Date(T0 + min * 60_000).toISOString();

export const body = (
  type: InstallEventType,
  min: number,
  payload: Record<string, unknown> = {},
  extra: Record<string, unknown> = {},
) => ({
  clientEventId: randomUUID(),
  type,
  deviceTime: at(min),
  payload,
  ...extra,
});

/** The taps of a clean install for the world's kit and packer, in order; `bend` changes one of them. */
export function cleanInstall(w: InstallWorld, bend: Partial<Record<InstallEventType, number>> = {}) {
  const t = (type: InstallEventType, min: number) => bend[type] ?? min;
  return [
    body('safety_acknowledged', t('safety_acknowledged', 0)),
    body('checks_done', t('checks_done', 4), {
      items: [
        { id: 'flow', ok: true },
        { id: 'clean', ok: true },
      ],
    }),
    body('dry_run_started', t('dry_run_started', 8)),
    body('dry_run_finished', t('dry_run_finished', 11), { seconds: 180 }),
    body('conditions_recorded', t('conditions_recorded', 13), {
      mixTempC: 20,
      pipeTempC: 20,
      resinKitId: w.resinKit.id,
      packerId: w.packer.id,
      patchLengthMm: 910,
    }),
    body('go_decision', t('go_decision', 14), { go: true }),
    body('resin_mixed', t('resin_mixed', 16)),
    body('patch_loaded', t('patch_loaded', 22)),
    body('packer_in_position', t('packer_in_position', 27)),
    // The example epoxy at 20 °C: 30 min to inflate after mixing, 90 min before deflating.
    body('bladder_inflated', t('bladder_inflated', 32), { pressureKpa: 100 }),
    body('pressure_reading', t('pressure_reading', 60), { pressureKpa: 98 }),
    body('bladder_deflated', t('bladder_deflated', 132)),
    body('inspection_recorded', t('inspection_recorded', 145), { result: 'pass', notes: 'Tight to the wall' }),
    body('signed_off', t('signed_off', 150), { name: 'The Foreman' }),
  ];
}

/** Posts the taps one by one and fails loudly on the first refusal. */
export async function postAll(installId: string, events: ReturnType<typeof body>[]) {
  for (const event of events) {
    const { status, body: answer } = await postEvent(installId, event);
    if (status !== 201) throw new Error(`${event.type} answered ${status}: ${JSON.stringify(answer)}`);
  }
}
