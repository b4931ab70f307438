import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { type Mailbox, startMailbox } from '../../scripts/mailbox.mjs';
import { v7 as uuidv7 } from 'uuid';
import { mutation, pullPage, push } from './sync-helpers.js';
import { bearer, createTestApp, DEMO_PASSWORD, expectErrorBody, signIn, signInTo, type SignedIn, type TestApp, until } from './test-app.js';

const CORIN = 'corin@valewiring.example';
const LARKFIELD = 'Larkfield Electrical & Data';
const OAKMERE = 'Oakmere Power & Data';

/**
 * One person, one password, several organisations: the demo subcontractor Corin Vale works for Larkfield and for
 * Oakmere, chooses at sign-in, and each session sees only the organisation chosen.
 */
describe('one person working for several organisations', () => {
  let t: TestApp;
  let mailbox: Mailbox;
  let larkfieldAdmin: SignedIn;
  let oakmereAdmin: SignedIn;

  beforeAll(async () => {
    mailbox = await startMailbox();
    t = await createTestApp({ SMTP_HOST: '127.0.0.1', SMTP_PORT: String(mailbox.port), PUBLIC_URL: 'https://wiretrail.example' });
    larkfieldAdmin = await signIn(t, 'admin@larkfield.example');
    oakmereAdmin = await signIn(t, 'admin@oakmere.example');
  });
  afterAll(async () => {
    await t.close();
    await mailbox.close();
  });

  it('offers the choice by name only once the password is right, and begins no session before it', async () => {
    const choice = await t.http.post('/api/auth/sign-in').send({ email: CORIN, password: DEMO_PASSWORD }).expect(200);
    expect(choice.body).toEqual({
      chooseOrganisation: [
        { id: larkfieldAdmin.user.organisationId, name: LARKFIELD },
        { id: oakmereAdmin.user.organisationId, name: OAKMERE },
      ],
    });
    const wrong = await t.http.post('/api/auth/sign-in').send({ email: CORIN, password: 'not-the-password' }).expect(401);
    const unknown = await t.http.post('/api/auth/sign-in').send({ email: 'nobody@valewiring.example', password: 'not-the-password' }).expect(401);
    expect(wrong.body).toEqual(unknown.body);
    // An organisation the person does not work for is no way in: the choice again.
    const elsewhere = await t.http.post('/api/auth/sign-in').send({ email: CORIN, password: DEMO_PASSWORD, organisationId: '01890000-0000-7000-8000-000000000000' }).expect(200);
    expect(elsewhere.body.accessToken).toBeUndefined();
    expect(elsewhere.body.chooseOrganisation).toHaveLength(2);
    const notAnId = await t.http.post('/api/auth/sign-in').send({ email: CORIN, password: DEMO_PASSWORD, organisationId: 'oakmere' }).expect(400);
    expectErrorBody(notAnId.body, 400);
  });

  it('carries the chosen organisation in the session, and a token for one never reads the other', async () => {
    const atOakmere = await signInTo(t, CORIN, OAKMERE);
    const atLarkfield = await signInTo(t, CORIN, LARKFIELD);
    expect(atOakmere.user).toMatchObject({ organisationId: oakmereAdmin.user.organisationId, organisationName: OAKMERE, role: 'technician' });
    expect(atLarkfield.user).toMatchObject({ organisationId: larkfieldAdmin.user.organisationId, organisationName: LARKFIELD, role: 'technician' });
    // Two memberships, two ids: every record of one organisation names its own.
    expect(atOakmere.user.id).not.toBe(atLarkfield.user.id);
    expect(atOakmere.organisations.map((o) => o.name)).toEqual([LARKFIELD, OAKMERE]);

    const oakmereRows = (await pullPage(t, atOakmere, 'corin-phone-oakmere', 0, 1000)).changes;
    const larkfieldRows = (await pullPage(t, atLarkfield, 'corin-phone-larkfield', 0, 1000)).changes;
    const oakmereVisit = oakmereRows.find((c) => c.entity === 'visit')!;
    expect(oakmereRows.filter((c) => c.entity === 'job').map((c) => c.row?.reference)).toEqual(['OPD-0107']);
    expect(JSON.stringify(oakmereRows)).not.toContain(larkfieldAdmin.user.organisationId);
    // Nothing is assigned to Corin at Larkfield yet: nothing of Oakmere's comes with that session either.
    expect(JSON.stringify(larkfieldRows)).not.toContain(oakmereAdmin.user.organisationId);
    expect(larkfieldRows.some((c) => c.id === oakmereVisit.id)).toBe(false);

    // A note on the Oakmere visit is taken from the Oakmere session and refused from the Larkfield one.
    const note = (s: SignedIn, device: string) => push(t, s, device, [mutation('note', uuidv7(), { visitId: oakmereVisit.id, siteId: oakmereVisit.row!.siteId as string, text: 'Kitchen isolator found behind the fridge.' }, { deviceId: device })]);
    expect((await note(atOakmere, 'corin-phone-oakmere'))[0]!.status).toBe('applied');
    expect((await note(atLarkfield, 'corin-phone-larkfield'))[0]!.status).not.toBe('applied');
    expect((await t.http.get('/api/auth/me').set(bearer(atLarkfield)).expect(200)).body.organisationId).toBe(larkfieldAdmin.user.organisationId);
  });

  it('switches organisation with the refresh token, ending the session it leaves', async () => {
    const atLarkfield = await signInTo(t, CORIN, LARKFIELD);
    const switched = await t.http.post('/api/auth/refresh').send({ refreshToken: atLarkfield.refreshToken, organisationId: oakmereAdmin.user.organisationId }).expect(200);
    expect(switched.body.user).toMatchObject({ organisationName: OAKMERE });
    await t.http.get('/api/auth/me').set(bearer(switched.body)).expect(200);
    await t.http.get('/api/auth/me').set(bearer(atLarkfield)).expect(401);
    await t.http.post('/api/auth/refresh').send({ refreshToken: atLarkfield.refreshToken }).expect(401);
    // Only to an organisation the person works for.
    const office = await signIn(t, 'office@larkfield.example');
    await t.http.post('/api/auth/refresh').send({ refreshToken: office.refreshToken, organisationId: oakmereAdmin.user.organisationId }).expect(401);
  });

  it('lets one organisation deactivate its membership without touching the other', async () => {
    const atOakmere = await signInTo(t, CORIN, OAKMERE);
    const atLarkfield = await signInTo(t, CORIN, LARKFIELD);
    await t.http.patch(`/api/users/${atLarkfield.user.id}`).set(bearer(larkfieldAdmin)).send({ active: false }).expect(200);
    await t.http.get('/api/auth/me').set(bearer(atLarkfield)).expect(401);
    await t.http.get('/api/auth/me').set(bearer(atOakmere)).expect(200);
    await t.http.post('/api/auth/refresh').send({ refreshToken: atOakmere.refreshToken }).expect(200);
    // With one membership left there is nothing to choose.
    const direct = await t.http.post('/api/auth/sign-in').send({ email: CORIN, password: DEMO_PASSWORD }).expect(200);
    expect(direct.body.user).toMatchObject({ organisationName: OAKMERE });
    // Oakmere cannot touch Larkfield's membership of the same person.
    await t.http.patch(`/api/users/${atLarkfield.user.id}`).set(bearer(oakmereAdmin)).send({ active: true }).expect(404);
    await t.http.patch(`/api/users/${atLarkfield.user.id}`).set(bearer(larkfieldAdmin)).send({ active: true }).expect(200);
    await signInTo(t, CORIN, LARKFIELD);
  });

  it('answers alike whether or not an address is known to another organisation, and the known person keeps one password', async () => {
    const before = mailbox.messages.length;
    const known = await t.http.post('/api/users').set(bearer(larkfieldAdmin)).send({ email: 'admin@oakmere.example', name: 'Imogen Tate', role: 'office' });
    const fresh = await t.http.post('/api/users').set(bearer(larkfieldAdmin)).send({ email: 'new.starter@larkfield.example', name: 'Rhys Dunmore', role: 'office' });
    expect([known.status, fresh.status]).toEqual([201, 201]);
    const shape = (body: Record<string, unknown>) => Object.fromEntries(Object.entries(body).map(([k, v]) => [k, k === 'id' || k === 'email' || k === 'name' ? typeof v : v]));
    expect(shape(known.body)).toEqual(shape(fresh.body));
    expect(JSON.stringify(known.body)).not.toMatch(/oakmere power|imogen@|organisations/i);

    await until(() => mailbox.messages.length === before + 2);
    const mail = (to: string) => mailbox.messages.slice(before).find((m) => m.to.includes(to))!;
    // The person new to Wiretrail sets a password from a link; the known one is told to sign in as they do.
    expect(mail('new.starter@larkfield.example').text).toContain('https://wiretrail.example/reset-password?token=');
    expect(mail('admin@oakmere.example').text).not.toContain('reset-password');
    expect(mail('admin@oakmere.example').text).toContain(`choose ${LARKFIELD}`);

    const choice = await t.http.post('/api/auth/sign-in').send({ email: 'admin@oakmere.example', password: DEMO_PASSWORD }).expect(200);
    expect(choice.body.chooseOrganisation.map((o: { name: string }) => o.name)).toEqual([LARKFIELD, OAKMERE]);
    const asOffice = await signInTo(t, 'admin@oakmere.example', LARKFIELD);
    expect(asOffice.user.role).toBe('office');
    await t.http.get('/api/users').set(bearer(asOffice)).expect(403);
    const asAdmin = await signInTo(t, 'admin@oakmere.example', OAKMERE);
    await t.http.get('/api/users').set(bearer(asAdmin)).expect(200);

    // Someone already in the team is the only 409, and it is the same for either kind of address.
    const again = await t.http.post('/api/users').set(bearer(larkfieldAdmin)).send({ email: 'admin@oakmere.example', name: 'Imogen', role: 'office' }).expect(409);
    const againFresh = await t.http.post('/api/users').set(bearer(larkfieldAdmin)).send({ email: 'new.starter@larkfield.example', name: 'Rhys', role: 'office' }).expect(409);
    expect(again.body).toEqual(againFresh.body);
  });

  it('lets a new person set their one password from the welcome link, and a new password ends their sessions everywhere', async () => {
    const before = mailbox.messages.length;
    await t.http.post('/api/users').set(bearer(oakmereAdmin)).send({ email: 'wren@valewiring.example', name: 'Wren Halse', role: 'technician' }).expect(201);
    await until(() => mailbox.messages.length === before + 1);
    const token = decodeURIComponent(/reset-password\?token=([^\s]+)/.exec(mailbox.messages[before]!.text)![1]!);
    // No password until it is set: an empty one or any guess is refused like an unknown address.
    await t.http.post('/api/auth/sign-in').send({ email: 'wren@valewiring.example', password: 'x' }).expect(401);
    await t.http.post('/api/auth/password-reset').send({ token, password: 'wren-sets-her-own' }).expect(204);
    const wren = await signIn(t, 'wren@valewiring.example', 'wren-sets-her-own');
    expect(wren.user).toMatchObject({ organisationName: OAKMERE });

    const atOakmere = await signInTo(t, CORIN, OAKMERE);
    const atLarkfield = await signInTo(t, CORIN, LARKFIELD);
    const sent = mailbox.messages.length;
    await t.http.post(`/api/users/${atLarkfield.user.id}/password-reset`).set(bearer(larkfieldAdmin)).expect(202);
    await until(() => mailbox.messages.length === sent + 1);
    const link = decodeURIComponent(/reset-password\?token=([^\s]+)/.exec(mailbox.messages[sent]!.text)![1]!);
    await t.http.post('/api/auth/password-reset').send({ token: link, password: 'corin-new-password' }).expect(204);
    await t.http.get('/api/auth/me').set(bearer(atOakmere)).expect(401);
    await t.http.get('/api/auth/me').set(bearer(atLarkfield)).expect(401);
    await t.http.post('/api/auth/sign-in').send({ email: CORIN, password: DEMO_PASSWORD }).expect(401);
    await signInTo(t, CORIN, OAKMERE, 'corin-new-password');
  });
});
