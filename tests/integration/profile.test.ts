import { describe, expect, it } from 'vitest';
import { GET, PATCH } from '@/app/api/profile/route';
import { User } from '@/models';
import { call, jsonBody } from './helpers/call';
import { signInAs, signOut } from './helpers/session';
import { makeWorld } from './helpers/world';

// The language setting: every signed-in user changes their own row only (the route takes no id), with a value
// from the zod enum; anything else is a 4xx that writes nothing.

const patch = (body: unknown) => call(PATCH, '/api/profile', {}, jsonBody('PATCH', body));

describe('/api/profile', () => {
  it('lets a technician switch their own screens to Spanish and back to the browser’s language', async () => {
    const w = await makeWorld('Profile');
    await signInAs(w.technician);
    expect((await call(GET, '/api/profile')).body).toMatchObject({
      id: w.technician.id,
      locale: null,
      role: 'technician',
    });

    const set = await patch({ locale: 'es' });
    expect(set.status).toBe(200);
    expect(set.body.locale).toBe('es');
    expect((await User.findByPk(w.technician.id))?.locale).toBe('es');
    // Nobody else's row moved.
    expect((await User.findByPk(w.foreman.id))?.locale).toBeNull();

    expect((await patch({ locale: null })).body.locale).toBeNull();
    expect((await User.findByPk(w.technician.id))?.locale).toBeNull();
  });

  it('refuses unknown languages, extra keys and non-JSON with 4xx and writes nothing', async () => {
    const w = await makeWorld('Profile');
    await signInAs(w.office);
    await patch({ locale: 'es' });
    for (const body of [
      { locale: 'fr' },
      { locale: 'es', role: 'admin' },
      { locale: 'es', userId: w.admin.id },
      {},
      'not json',
    ]) {
      const { status, body: answer } = await patch(body);
      expect(status, JSON.stringify(body)).toBe(400);
      expect(answer.error.message).toBeTruthy();
    }
    const row = await User.findByPk(w.office.id);
    expect(row?.locale).toBe('es');
    expect(row?.role).toBe('office');
    expect((await User.findByPk(w.admin.id))?.locale).toBeNull();
  });

  it('answers 401 signed out', async () => {
    signOut();
    expect((await patch({ locale: 'es' })).status).toBe(401);
    expect((await call(GET, '/api/profile')).status).toBe(401);
  });
});
