import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { POST as postEventRoute } from '@/app/api/installs/[id]/events/route';
import { Install, Repair } from '@/models';
import { call } from './helpers/call';
import { body, postEvent, startInstall } from './helpers/installs';
import { signInAs, signOut } from './helpers/session';
import { makeInstallWorld, type InstallWorld } from './helpers/world';

// A refused tap parks on the tablet under "Needs attention" with the server's sentence: a Spanish user reads it in
// Spanish (their setting, else the browser's language), an English user in the same English as ever, and the
// JSON keeps its shape.

const postWithLanguage = (installId: string, tap: unknown, acceptLanguage: string) =>
  call(
    postEventRoute,
    `/api/installs/${installId}/events`,
    { id: installId },
    {
      method: 'POST',
      body: JSON.stringify(tap),
      headers: { 'content-type': 'application/json', 'accept-language': acceptLanguage },
    },
  );

async function freshInstall(w: InstallWorld) {
  const repair = await Repair.create({
    companyId: w.company.id,
    jobId: w.job.id,
    segmentId: w.segment.id,
    distanceMm: 21000,
    defectType: 'hole',
    conditionGrade: 3,
    defectLengthMm: 300,
  });
  await signInAs(w.foreman);
  return startInstall({ ...w, repair });
}

describe('tap refusals in the user’s language', () => {
  let w: InstallWorld;
  beforeAll(async () => {
    w = await makeInstallWorld('Idioma');
    await w.technician.update({ locale: 'es' });
  });
  beforeEach(() => signOut());

  it('answers an out-of-order tap in Spanish to a Spanish technician and in English to the foreman', async () => {
    const id = await freshInstall(w);
    await signInAs(w.technician);
    const spanish = await postEvent(id, body('patch_loaded', 20));
    expect(spanish).toEqual({
      status: 422,
      body: { error: { message: 'Registre «Resina mezclada» antes de «Parche cargado».' } },
    });

    await signInAs(w.foreman);
    const english = await postEvent(id, body('patch_loaded', 20));
    expect(english).toEqual({
      status: 422,
      body: { error: { message: 'Record "resin mixed" before "patch loaded".' } },
    });
    // The browser's language counts only for a user without a setting of their own.
    expect((await postWithLanguage(id, body('patch_loaded', 20), 'es-MX,es;q=0.9')).body.error.message).toBe(
      'Registre «Resina mezclada» antes de «Parche cargado».',
    );
    await signInAs(w.technician);
    expect((await postWithLanguage(id, body('patch_loaded', 20), 'en')).body.error.message).toMatch(/^Registre/);
  });

  it('answers a tap on a closed install in Spanish to a Spanish technician and in English to the foreman', async () => {
    const id = await freshInstall(w);
    await Install.update({ status: 'abandoned' }, { where: { id } });
    await signInAs(w.technician);
    expect(await postEvent(id, body('safety_acknowledged', 0))).toEqual({
      status: 409,
      body: {
        error: { message: 'Esta instalación está cerrada (abandonada): ya no se puede registrar nada en ella.' },
      },
    });
    await signInAs(w.foreman);
    expect(await postEvent(id, body('safety_acknowledged', 0))).toEqual({
      status: 409,
      body: { error: { message: 'This install is closed (abandoned): nothing more can be recorded on it.' } },
    });
  });

  it('words a device time out of bounds in Spanish, in the message and its field', async () => {
    const id = await freshInstall(w);
    await signInAs(w.technician);
    const late = { ...body('safety_acknowledged', 0), deviceTime: new Date(Date.now() + 3600_000).toISOString() };
    const refused = await postEvent(id, late);
    expect(refused.status).toBe(422);
    expect(refused.body.error.message).toMatch(/^La hora del toque es más de 5 minutos posterior/);
    expect(refused.body.error.fields).toEqual({ deviceTime: [refused.body.error.message] });
  });
});
