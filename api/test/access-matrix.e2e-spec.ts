/**
 * The access matrix of api/README.md, run as a table: every route × every role × member / not a
 * member, plus an API token of the project and one of another project. "Allowed" means the guards let
 * the call through (any answer but 401/403); what the allowed call then does is tested elsewhere.
 */
import request from 'supertest';
import { Role } from '../src/auth/role.enum.js';
import { InvitationsService } from '../src/users/invitations.service.js';
import { bearer, bootApp, calcFile, EMAIL, login, type TestApp } from './helpers.js';

type Actor =
  | 'anon'
  | 'admin'
  | 'consultantM'
  | 'consultantN'
  | 'checkerM'
  | 'checkerN'
  | 'ownerM'
  | 'ownerN'
  | 'tokenOwn'
  | 'tokenOther';
const ACTORS: Actor[] = [
  'anon',
  'admin',
  'consultantM',
  'consultantN',
  'checkerM',
  'checkerN',
  'ownerM',
  'ownerN',
  'tokenOwn',
  'tokenOther',
];
const SIGNED_IN: Actor[] = ACTORS.filter((a) => a !== 'anon' && !a.startsWith('token'));
const MEMBERS: Actor[] = ['admin', 'consultantM', 'checkerM', 'ownerM'];

interface Ids {
  projectA: number;
  projectB: number;
  submittal: number;
  revision: number;
  discrepancy: number;
  calcFile: number;
  outsiderConsultant: number;
}

interface Row {
  name: string;
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  path: (ids: Ids) => string;
  body?: (ids: Ids) => object;
  upload?: boolean;
  allowed: Actor[];
}

const ROWS: Row[] = [
  { name: 'GET /health', method: 'get', path: () => '/api/health', allowed: ACTORS },
  {
    name: 'GET /auth/me',
    method: 'get',
    path: () => '/api/auth/me',
    allowed: [...SIGNED_IN, 'tokenOwn', 'tokenOther'],
  },
  { name: 'GET /users', method: 'get', path: () => '/api/users', allowed: ['admin'] },
  {
    name: 'PATCH /users/:id',
    method: 'patch',
    path: (i) => `/api/users/${i.outsiderConsultant}`,
    body: () => ({ name: 'Ida Brandt' }),
    allowed: ['admin'],
  },
  { name: 'GET /invitations', method: 'get', path: () => '/api/invitations', allowed: ['admin'] },
  {
    name: 'POST /invitations',
    method: 'post',
    path: () => '/api/invitations',
    body: () => ({ email: EMAIL.consultant, name: 'Dup', role: 'consultant' }),
    allowed: ['admin'],
  },
  {
    name: 'POST /invitations/:id/resend',
    method: 'post',
    path: () => '/api/invitations/999999/resend',
    allowed: ['admin'],
  },
  {
    name: 'POST /invitations/:id/revoke',
    method: 'post',
    path: () => '/api/invitations/999999/revoke',
    allowed: ['admin'],
  },
  {
    name: 'GET /invitations/:token',
    method: 'get',
    path: () => '/api/invitations/inv_unknown',
    allowed: ACTORS,
  },
  { name: 'GET /organisations', method: 'get', path: () => '/api/organisations', allowed: SIGNED_IN },
  {
    name: 'POST /organisations',
    method: 'post',
    path: () => '/api/organisations',
    body: () => ({ name: 'Larchmont Peer Review', kind: 'checker' }),
    allowed: ['admin'],
  },
  {
    name: 'GET /projects',
    method: 'get',
    path: () => '/api/projects',
    allowed: [...SIGNED_IN, 'tokenOwn', 'tokenOther'],
  },
  {
    name: 'POST /projects',
    method: 'post',
    path: () => '/api/projects',
    body: () => ({ name: 'Matrix scratch project' }),
    allowed: ['admin'],
  },
  {
    name: 'GET /projects/:id',
    method: 'get',
    path: (i) => `/api/projects/${i.projectA}`,
    allowed: [...MEMBERS, 'tokenOwn'],
  },
  {
    name: 'PATCH /projects/:id',
    method: 'patch',
    path: (i) => `/api/projects/${i.projectA}`,
    body: () => ({}),
    allowed: ['admin'],
  },
  {
    name: 'GET /projects/:id/members',
    method: 'get',
    path: (i) => `/api/projects/${i.projectA}/members`,
    allowed: [...MEMBERS, 'tokenOwn'],
  },
  {
    name: 'POST /projects/:id/members',
    method: 'post',
    path: (i) => `/api/projects/${i.projectA}/members`,
    body: () => ({ userId: 1 }),
    allowed: ['admin'],
  },
  {
    name: 'DELETE /projects/:id/members/:userId',
    method: 'delete',
    path: (i) => `/api/projects/${i.projectA}/members/999999`,
    allowed: ['admin'],
  },
  {
    name: 'GET /projects/:id/submittals',
    method: 'get',
    path: (i) => `/api/projects/${i.projectA}/submittals`,
    allowed: [...MEMBERS, 'tokenOwn'],
  },
  {
    name: 'POST /projects/:id/submittals',
    method: 'post',
    path: (i) => `/api/projects/${i.projectA}/submittals`,
    upload: true,
    allowed: ['consultantM', 'checkerM', 'tokenOwn'],
  },
  {
    name: 'GET /projects/:id/discrepancies',
    method: 'get',
    path: (i) => `/api/projects/${i.projectA}/discrepancies`,
    allowed: [...MEMBERS, 'tokenOwn'],
  },
  {
    name: 'GET /projects/:id/discrepancies.csv',
    method: 'get',
    path: (i) => `/api/projects/${i.projectA}/discrepancies.csv`,
    allowed: [...MEMBERS, 'tokenOwn'],
  },
  {
    name: 'POST /projects/:id/discrepancies/bulk-transition',
    method: 'post',
    path: (i) => `/api/projects/${i.projectA}/discrepancies/bulk-transition`,
    body: () => ({ ids: [999999], to: 'accepted' }),
    allowed: ['checkerM'],
  },
  {
    name: 'GET /projects/:id/events',
    method: 'get',
    path: (i) => `/api/projects/${i.projectA}/events`,
    allowed: [...MEMBERS, 'tokenOwn'],
  },
  {
    name: 'GET /submittals/:id',
    method: 'get',
    path: (i) => `/api/submittals/${i.submittal}`,
    allowed: [...MEMBERS, 'tokenOwn'],
  },
  {
    name: 'GET /submittals/:id/diff',
    method: 'get',
    path: (i) => `/api/submittals/${i.revision}/diff`,
    allowed: [...MEMBERS, 'tokenOwn'],
  },
  {
    name: 'GET /submittals/:id/events',
    method: 'get',
    path: (i) => `/api/submittals/${i.submittal}/events`,
    allowed: [...MEMBERS, 'tokenOwn'],
  },
  {
    name: 'GET /submittals/:id/report',
    method: 'get',
    path: (i) => `/api/submittals/${i.submittal}/report`,
    allowed: [...MEMBERS, 'tokenOwn'],
  },
  {
    name: 'GET /submittals/:id/files',
    method: 'get',
    path: (i) => `/api/submittals/${i.submittal}/files`,
    allowed: [...MEMBERS, 'tokenOwn'],
  },
  {
    name: 'GET /submittals/:id/results',
    method: 'get',
    path: (i) => `/api/submittals/${i.submittal}/results`,
    allowed: [...MEMBERS, 'tokenOwn'],
  },
  {
    name: 'POST /submittals/:id/recheck',
    method: 'post',
    path: (i) => `/api/submittals/${i.submittal}/recheck`,
    allowed: ['checkerM'],
  },
  {
    name: 'POST /submittals/:id/stamp',
    method: 'post',
    path: (i) => `/api/submittals/${i.revision}/stamp`,
    body: () => ({ action: 'rejected', comment: 'matrix' }),
    allowed: ['checkerM'],
  },
  {
    name: 'GET /calc-files/:id',
    method: 'get',
    path: (i) => `/api/calc-files/${i.calcFile}`,
    allowed: [...MEMBERS, 'tokenOwn'],
  },
  {
    name: 'GET /calc-files/:id/content',
    method: 'get',
    path: (i) => `/api/calc-files/${i.calcFile}/content`,
    allowed: [...MEMBERS, 'tokenOwn'],
  },
  {
    name: 'GET /discrepancies/:id',
    method: 'get',
    path: (i) => `/api/discrepancies/${i.discrepancy}`,
    allowed: [...MEMBERS, 'tokenOwn'],
  },
  {
    name: 'POST /discrepancies/:id/transitions (answered)',
    method: 'post',
    path: (i) => `/api/discrepancies/${i.discrepancy}/transitions`,
    body: () => ({ to: 'answered', note: 'matrix' }),
    allowed: ['consultantM'],
  },
  {
    name: 'POST /discrepancies/:id/transitions (waived)',
    method: 'post',
    path: (i) => `/api/discrepancies/${i.discrepancy}/transitions`,
    body: () => ({ to: 'waived' }),
    allowed: ['checkerM'],
  },
  {
    name: 'POST /discrepancies/:id/transitions (returned: reopen or return)',
    method: 'post',
    path: (i) => `/api/discrepancies/${i.discrepancy}/transitions`,
    body: () => ({ to: 'returned' }),
    allowed: ['checkerM'],
  },
  {
    name: 'PATCH /discrepancies/:id/assignment',
    method: 'patch',
    path: (i) => `/api/discrepancies/${i.discrepancy}/assignment`,
    body: () => ({ dueDate: '2026-12-31' }),
    allowed: ['checkerM'],
  },
  {
    name: 'POST /discrepancies/:id/comments',
    method: 'post',
    path: (i) => `/api/discrepancies/${i.discrepancy}/comments`,
    body: () => ({ body: 'matrix' }),
    allowed: ['consultantM', 'checkerM'],
  },
  {
    name: 'POST /discrepancies/:id/acknowledge',
    method: 'post',
    path: (i) => `/api/discrepancies/${i.discrepancy}/acknowledge`,
    allowed: ['ownerM'],
  },
  { name: 'GET /dashboard', method: 'get', path: () => '/api/dashboard', allowed: SIGNED_IN },
  {
    name: 'GET /dashboard/open-discrepancies.csv',
    method: 'get',
    path: () => '/api/dashboard/open-discrepancies.csv',
    allowed: SIGNED_IN,
  },
  {
    name: 'GET /notifications',
    method: 'get',
    path: () => '/api/notifications',
    allowed: SIGNED_IN,
  },
  {
    name: 'GET /notifications/unread-count',
    method: 'get',
    path: () => '/api/notifications/unread-count',
    allowed: SIGNED_IN,
  },
  {
    name: 'POST /notifications/:id/read',
    method: 'post',
    path: () => '/api/notifications/999999/read',
    allowed: SIGNED_IN,
  },
  {
    name: 'POST /notifications/read-all',
    method: 'post',
    path: () => '/api/notifications/read-all',
    allowed: SIGNED_IN,
  },
  {
    name: 'GET /notifications/settings',
    method: 'get',
    path: () => '/api/notifications/settings',
    allowed: SIGNED_IN,
  },
  {
    name: 'PUT /notifications/settings',
    method: 'put',
    path: () => '/api/notifications/settings',
    body: () => ({ settings: [] }),
    allowed: SIGNED_IN,
  },
  { name: 'GET /tokens', method: 'get', path: () => '/api/tokens', allowed: ['consultantM', 'consultantN'] },
  {
    name: 'POST /tokens (project A)',
    method: 'post',
    path: () => '/api/tokens',
    body: (i) => ({ name: 'matrix', projectId: i.projectA }),
    allowed: ['consultantM'],
  },
  {
    name: 'DELETE /tokens/:id',
    method: 'delete',
    path: () => '/api/tokens/999999',
    allowed: ['consultantM', 'consultantN'],
  },
  { name: 'GET /mail/outbox', method: 'get', path: () => '/api/mail/outbox', allowed: ['admin'] },
  {
    name: 'POST /mail/outbox/flush',
    method: 'post',
    path: () => '/api/mail/outbox/flush',
    allowed: ['admin'],
  },
  // The mailbox shows invitation links: admin only, even in demo mode.
  { name: 'GET /mail/mailbox', method: 'get', path: () => '/api/mail/mailbox', allowed: ['admin'] },
];

let t: TestApp;
const auth: Partial<Record<Actor, string>> = {};
let ids: Ids;

beforeAll(async () => {
  t = await bootApp();
  auth.admin = await login(t.http, EMAIL.admin);
  auth.consultantM = await login(t.http, EMAIL.consultant);
  auth.checkerM = await login(t.http, EMAIL.checker);
  auth.ownerM = await login(t.http, EMAIL.owner);
  const projectB = await request(t.http)
    .post('/api/projects')
    .set(bearer(auth.admin))
    .send({ name: 'Quayside Lift Bridge (other project)' });
  const invitations = t.app.get(InvitationsService);
  const adminUser = { id: 1, email: EMAIL.admin, name: 'Sam Oduya', role: Role.Admin, organisationId: null };
  const outsiders: [Actor, string, Role][] = [
    ['consultantN', 'ida@fennick-ode.example.test', Role.Consultant],
    ['checkerN', 'rafe@larchmont-review.example.test', Role.Checker],
    ['ownerN', 'lena@tidewater-crossing.example.test', Role.OwnerRep],
  ];
  let outsiderConsultant = 0;
  for (const [actor, email, role] of outsiders) {
    const { token } = await invitations.create({ email, name: actor, role }, adminUser);
    const accepted = await request(t.http)
      .post(`/api/invitations/${token}/accept`)
      .send({ password: 'outsider-password-1' });
    await request(t.http)
      .post(`/api/projects/${projectB.body.id}/members`)
      .set(bearer(auth.admin))
      .send({ userId: accepted.body.id });
    auth[actor] = await login(t.http, email, 'outsider-password-1');
    if (actor === 'consultantN') outsiderConsultant = accepted.body.id as number;
  }
  auth.tokenOwn = (
    await request(t.http).post('/api/tokens').set(bearer(auth.consultantM)).send({ name: 'ci', projectId: 1 })
  ).body.token;
  auth.tokenOther = (
    await request(t.http)
      .post('/api/tokens')
      .set(bearer(auth.consultantN as string))
      .send({ name: 'ci', projectId: projectB.body.id })
  ).body.token;
  const submittals = (await request(t.http).get('/api/projects/1/submittals').set(bearer(auth.admin)))
    .body as { id: number; revisionOfId: number | null }[];
  const revision = submittals.find((s) => s.revisionOfId !== null);
  const original = submittals.find((s) => s.revisionOfId === null);
  const discrepancies = await request(t.http)
    .get('/api/projects/1/discrepancies?status=raised&pageSize=1')
    .set(bearer(auth.admin));
  const files = await request(t.http).get(`/api/submittals/${original?.id}/files`).set(bearer(auth.admin));
  ids = {
    projectA: 1,
    projectB: projectB.body.id,
    submittal: original?.id ?? 0,
    revision: revision?.id ?? 0,
    discrepancy: discrepancies.body.items[0].id,
    calcFile: files.body[0].id,
    outsiderConsultant,
  };
});
afterAll(async () => t.close());

it('has every actor signed in and every fixture id', () => {
  for (const actor of ACTORS.filter((a) => a !== 'anon')) expect(auth[actor]).toEqual(expect.any(String));
  expect(Object.values(ids).every((v) => Number.isInteger(v) && v > 0)).toBe(true);
});

describe.each(ROWS)('$name', (row) => {
  it.each(ACTORS)(`%s`, async (actor) => {
    let req = request(t.http)[row.method](row.path(ids));
    const token = auth[actor];
    if (token) req = req.set(bearer(token));
    if (row.upload)
      req = req
        .field('title', `matrix upload by ${actor}`)
        .attach('files', calcFile(`M-${actor}`), `matrix-${actor}.json`);
    else if (row.body) req = req.send(row.body(ids));
    const res = await req;
    if (row.allowed.includes(actor)) {
      expect([401, 403]).not.toContain(res.status);
      expect(res.status).toBeLessThan(500);
    } else {
      expect(res.status).toBe(actor === 'anon' ? 401 : 403);
      expect(res.body).toEqual(
        expect.objectContaining({
          statusCode: res.status,
          error: expect.any(String),
          message: expect.any(String),
        }),
      );
    }
  });
});
