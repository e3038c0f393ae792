import { afterAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.ts';
import { Me } from '../../shared/schemas/account.ts';
import { DEFAULT_UNIT_PREFERENCES, UnitPreferences } from '../../shared/schemas/unit-preferences.ts';
import { browserLike, signedIn } from './helpers/agents.ts';
import { createUser } from './helpers/people.ts';
import { createTestApp } from './helpers/test-app.ts';

const t = await createTestApp();
afterAll(() => t.close());

const chosen: UnitPreferences = { damperVelocity: 'mm/s', rate: 'lbf/in', speed: 'mph', length: 'in' };

describe('unit preferences', () => {
  it('start at the defaults in GET /api/auth/me, save with PUT /api/account/units, and come back on the next sign-in', async () => {
    const user = await createUser(t.db);
    const b = await signedIn(t.url, user.email, user.password);
    expect(Me.parse((await b.get('/api/auth/me').expect(200)).body).units).toEqual(DEFAULT_UNIT_PREFERENCES);

    const saved = await b.put('/api/account/units', chosen).expect(200);
    expect(UnitPreferences.parse(saved.body)).toEqual(chosen);

    const again = await signedIn(t.url, user.email, user.password);
    expect(Me.parse((await again.get('/api/auth/me').expect(200)).body).units).toEqual(chosen);
  });

  it('are kept per person: one person choosing leaves another at the defaults', async () => {
    const a = await createUser(t.db);
    const other = await createUser(t.db);
    await (await signedIn(t.url, a.email, a.password)).put('/api/account/units', chosen).expect(200);
    const b = await signedIn(t.url, other.email, other.password);
    expect(Me.parse((await b.get('/api/auth/me').expect(200)).body).units).toEqual(DEFAULT_UNIT_PREFERENCES);
  });

  it('refuse an unknown unit with 400 naming the field, and keep what was saved', async () => {
    const user = await createUser(t.db);
    const b = await signedIn(t.url, user.email, user.password);
    await b.put('/api/account/units', chosen).expect(200);
    const res = await b.put('/api/account/units', { ...chosen, speed: 'knots' }).expect(400);
    const body = ErrorBody.parse(res.body);
    expect(body.error.code).toBe('bad_request');
    expect(body.error.fields?.map((f) => f.path)).toEqual(['speed']);
    const missing = ErrorBody.parse((await b.put('/api/account/units', { damperVelocity: 'mm/s', rate: 'N/m', speed: 'm/s' }).expect(400)).body);
    expect(missing.error.fields?.map((f) => f.path)).toEqual(['length']);
    expect(Me.parse((await b.get('/api/auth/me').expect(200)).body).units).toEqual(chosen);
  });

  it('need a session', async () => {
    const anon = await browserLike(t.url);
    await anon.put('/api/account/units', chosen).expect(401);
  });
});
