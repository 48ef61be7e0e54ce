import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { can } from '@sheaf/engine/api';
import type { Route } from '../src/routes/defineRoute';
import { insertOrganization } from '../src/services/organizations';
import { createPasswordReset } from '../src/services/passwordResets';
import {
  ACTORS,
  addMember,
  createInvitation,
  createSheetIn,
  createTeam,
  createUser,
  signInAs,
  TEST_PASSWORD,
  uniqueEmail,
  type Actor,
  type Team,
  type TestUser,
} from './helpers/fixtures';
import { approvedSheet, lugSheetIn, noteOn, sheetInCheck } from './helpers/review';
import { demoMaterialBody, insertDemoMaterial, insertDemoTemplate, uniqueMaterialKey } from './helpers/libraryFixtures';
import type { TestClient } from './helpers/TestClient';
import { startTestServer, type TestServer } from './helpers/testServer';

/** A request that succeeds for a caller the route admits. */
interface Call {
  params?: Record<string, string>;
  /** A query string, without the `?`. */
  query?: string;
  body?: unknown;
}

interface CallContext {
  server: TestServer;
  team: Team;
  actor: Actor;
  /** The actor's account; undefined for anonymous. */
  user: TestUser | undefined;
}

/**
 * How to call each route of the route table so that it succeeds when the caller is allowed.
 * A route without an entry here fails the matrix: every new route must join it.
 */
const CALLS: Record<string, (ctx: CallContext) => Promise<Call>> = {
  'system.health': async () => ({}),
  'system.openapi': async () => ({}),
  'auth.csrf': async () => ({}),
  'dev.mail': async () => ({}),
  'auth.signup': async () => ({ body: { email: uniqueEmail('signup'), password: TEST_PASSWORD, name: 'Matrix Signup' } }),
  'auth.signin': async ({ server, user }) => {
    const who = user ?? (await createUser(server.deps.dataSource, 'signin'));
    return { body: { email: who.email, password: who.password } };
  },
  'auth.signout': async () => ({}),
  'auth.me': async () => ({}),
  'auth.updateMe': async ({ user }) => ({ body: { name: user?.name ?? 'Nobody' } }),
  'auth.resetRequest': async () => ({ body: { email: uniqueEmail('reset') } }),
  'auth.resetConfirm': async ({ server }) => {
    const throwaway = await createUser(server.deps.dataSource, 'reset-target');
    const token = await createPasswordReset(server.deps.dataSource, throwaway.id);
    return { body: { token, password: 'a brand new passphrase' } };
  },
  'orgs.list': async () => ({}),
  'orgs.create': async () => ({ body: { name: 'Matrix Fabrication' } }),
  'members.list': async ({ team }) => ({ params: { orgId: team.organizationId } }),
  'invitations.create': async ({ team }) => ({
    params: { orgId: team.organizationId },
    body: { email: uniqueEmail('invitee'), role: 'viewer' },
  }),
  'members.update': async ({ server, team }) => {
    const target = await createUser(server.deps.dataSource, 'role-target');
    await addMember(server.deps.dataSource, team.organizationId, target.id, 'viewer');
    return { params: { orgId: team.organizationId, userId: target.id }, body: { role: 'checker' } };
  },
  'members.remove': async ({ server, team }) => {
    const target = await createUser(server.deps.dataSource, 'removal-target');
    await addMember(server.deps.dataSource, team.organizationId, target.id, 'viewer');
    return { params: { orgId: team.organizationId, userId: target.id } };
  },
  'invitations.preview': async ({ server, team }) => ({
    params: { token: await createInvitation(server.deps.dataSource, { organizationId: team.organizationId, email: uniqueEmail(), role: 'checker' }) },
  }),
  'invitations.accept': async ({ server, user }) => {
    // A fresh organization, so the actor is not a member of it yet.
    const organization = await insertOrganization(server.deps.dataSource.manager, 'Matrix Invitations');
    const email = user?.email ?? uniqueEmail('anonymous');
    return { params: { token: await createInvitation(server.deps.dataSource, { organizationId: organization.id, email, role: 'viewer' }) } };
  },
  'projects.list': async ({ team }) => ({ params: { orgId: team.organizationId } }),
  'projects.create': async ({ team }) => ({ params: { orgId: team.organizationId }, body: { name: 'Matrix trolley rail' } }),
  'sheets.search': async ({ team }) => ({ params: { orgId: team.organizationId } }),
  'sheets.listInProject': async ({ team }) => ({ params: { projectId: team.project.id } }),
  'sheets.create': async ({ team }) => ({ params: { projectId: team.project.id }, body: { title: 'Matrix sheet' } }),
  'sheets.get': async ({ team }) => ({ params: { sheetId: team.sheet.id } }),
  'sheets.update': async ({ server, team }) => {
    const sheet = await createSheetIn(server.deps.dataSource, team.project, team.users.engineer.id, 'To be renamed');
    return { params: { sheetId: sheet.id }, body: { title: 'Renamed by the matrix' } };
  },
  'sheets.delete': async ({ server, team }) => {
    const sheet = await createSheetIn(server.deps.dataSource, team.project, team.users.engineer.id, 'To be deleted');
    return { params: { sheetId: sheet.id } };
  },
  // The materials library and templates.
  'materials.list': async ({ team }) => ({ params: { orgId: team.organizationId } }),
  'materials.create': async ({ team }) => ({ params: { orgId: team.organizationId }, body: { id: uniqueMaterialKey(), ...demoMaterialBody() } }),
  'materials.update': async ({ server, team }) => ({
    params: { orgId: team.organizationId, materialKey: await insertDemoMaterial(server.deps.dataSource, team) },
    body: demoMaterialBody('Matrix plate steel, renamed'),
  }),
  'materials.delete': async ({ server, team }) => ({
    params: { orgId: team.organizationId, materialKey: await insertDemoMaterial(server.deps.dataSource, team) },
  }),
  'materials.export': async ({ team }) => ({ params: { orgId: team.organizationId } }),
  'materials.import': async ({ team }) => ({
    params: { orgId: team.organizationId },
    body: { csv: `id,name,category,Sy,Sy_basis,Sy_source\n${uniqueMaterialKey()},Imported plate (demo),carbon-steel,300 MPa,minimum,Demo certificate` },
  }),
  'templates.list': async ({ team }) => ({ params: { orgId: team.organizationId } }),
  'templates.get': async ({ team }) => ({ params: { orgId: team.organizationId, templateId: 'builtin:thin-walled-sphere' } }),
  'templates.createFromSheet': async ({ team }) => ({
    params: { sheetId: team.sheet.id },
    body: { title: 'Matrix template', description: '', category: 'Lifting gear', parameters: [] },
  }),
  'templates.newVersion': async ({ server, team }) => ({
    params: { orgId: team.organizationId, templateId: await insertDemoTemplate(server.deps.dataSource, team) },
    body: { title: 'Matrix lug, v2', description: '', category: 'Lifting gear', parameters: [] },
  }),
  'sheets.createFromTemplate': async ({ team }) => ({
    params: { projectId: team.project.id },
    body: { templateId: 'builtin:thin-walled-sphere', title: 'Matrix receiver', parameters: { p: '2 MPa', r: '300 mm', t: '8 mm' } },
  }),
  'templates.createFromRevision': async ({ server, team }) => ({
    params: { sheetId: await approvedSheet(server.deps.dataSource, team), number: '1' },
    body: { title: 'Matrix lug, approved', description: '', category: 'Lifting gear', parameters: [] },
  }),
  // The check workflow. Per-sheet rules (only the assigned checker, never the preparer) are
  // met by the setup, so the table alone decides each cell of the matrix.
  'review.state': async ({ team }) => ({ params: { sheetId: team.sheet.id } }),
  'review.submit': async ({ server, team }) => ({
    params: { sheetId: await lugSheetIn(server.deps.dataSource, team) },
    body: { checkerUserId: team.users.checker.id, message: 'Ready for check' },
  }),
  'review.return': async ({ server, team, actor, user }) => ({
    params: { sheetId: await sheetInCheck(server.deps.dataSource, team, checkerFor(team, actor, user)) },
    body: { message: 'Section modulus uses the wrong width' },
  }),
  'review.approve': async ({ server, team, actor, user }) => ({
    params: { sheetId: await sheetInCheck(server.deps.dataSource, team, checkerFor(team, actor, user)) },
    body: {},
  }),
  'review.reassignChecker': async ({ server, team }) => ({
    params: { sheetId: await sheetInCheck(server.deps.dataSource, team, team.users.checker.id) },
    body: { checkerUserId: team.users.owner.id },
  }),
  'notes.list': async ({ team }) => ({ params: { sheetId: team.sheet.id } }),
  'notes.create': async ({ server, team }) => ({
    params: { sheetId: await lugSheetIn(server.deps.dataSource, team) },
    body: { cellId: 's1', body: 'Is the bending lever arm measured from the weld toe?' },
  }),
  'notes.resolve': async ({ server, team }) => {
    const sheetId = await lugSheetIn(server.deps.dataSource, team);
    return { params: { sheetId, noteId: await noteOn(server.deps.dataSource, sheetId, team.users.checker.id) } };
  },
  'notes.reopen': async ({ server, team }) => {
    const sheetId = await lugSheetIn(server.deps.dataSource, team);
    return { params: { sheetId, noteId: await noteOn(server.deps.dataSource, sheetId, team.users.checker.id, { resolved: true }) } };
  },
  'revisions.list': async ({ team }) => ({ params: { sheetId: team.sheet.id } }),
  'revisions.get': async ({ server, team }) => ({ params: { sheetId: await approvedSheet(server.deps.dataSource, team), number: '1' } }),
  'revisions.diff': async ({ server, team }) => ({
    params: { sheetId: await approvedSheet(server.deps.dataSource, team) },
    query: 'from=1&to=current',
  }),
  'sheets.history': async ({ team }) => ({ params: { sheetId: team.sheet.id } }),
};

/** The checker to submit to so that `actor` may return or approve: the actor when their role checks. */
function checkerFor(team: Team, actor: Actor, user: TestUser | undefined): string {
  return user !== undefined && (actor === 'owner' || actor === 'checker') ? user.id : team.users.checker.id;
}

/** Routes after which the client's session is another one (or none). */
const SESSION_CHANGING = new Set(['auth.signin', 'auth.signup', 'auth.signout']);

/** The status the permission table implies for this caller. */
function expectedStatus(route: Route, actor: Actor): { status: number; code?: string } {
  const success = { status: route.response.status };
  switch (route.access.kind) {
    case 'public':
      return success;
    case 'signed-in':
      return actor === 'anonymous' ? { status: 401, code: 'not-signed-in' } : success;
    case 'permission':
      if (actor === 'anonymous') return { status: 401, code: 'not-signed-in' };
      if (actor === 'outsider') return { status: 404, code: 'not-found' };
      return can(actor, route.access.action) ? success : { status: 403, code: 'forbidden' };
  }
}

function fillPath(path: string, params: Record<string, string> = {}): string {
  return path.replace(/:(\w+)/g, (_, name: string) => {
    const value = params[name];
    if (value === undefined) throw new Error(`no value for :${name} in ${path}`);
    return encodeURIComponent(value);
  });
}

describe('route x role matrix, generated from the route table and the permission table', () => {
  let server: TestServer;
  let team: Team;

  beforeAll(async () => {
    server = await startTestServer();
    team = await createTeam(server.deps.dataSource, 'matrix');
  });
  afterAll(async () => {
    await server?.close();
  });

  it('has a way to call every route in the table', () => {
    const missing = server.routes.map((r) => r.id).filter((id) => !(id in CALLS));
    expect(missing).toEqual([]);
    expect(Object.keys(CALLS).filter((id) => !server.routes.some((r) => r.id === id))).toEqual([]);
  });

  it('answers every route for anonymous, non-member, viewer, checker, engineer and owner as the table says', async () => {
    const cells: string[] = [];
    const failures: string[] = [];
    // One signed-in client per actor; routes that replace the session get a fresh one each time.
    const clients = new Map<Actor, TestClient>();
    for (const actor of ACTORS) clients.set(actor, await signInAs(server, team, actor));
    // A route without a CALLS entry fails the test above; here the others are still checked.
    const callable = server.routes.filter((route) => route.id in CALLS);
    for (const route of callable) {
      for (const actor of ACTORS) {
        const expected = expectedStatus(route, actor);
        const client = SESSION_CHANGING.has(route.id) ? await signInAs(server, team, actor) : (clients.get(actor) as TestClient);
        const user = actor === 'anonymous' ? undefined : team.users[actor];
        const call = await (CALLS[route.id] as (ctx: CallContext) => Promise<Call>)({ server, team, actor, user });
        const path = fillPath(route.path, call.params) + (call.query ? `?${call.query}` : '');
        const response = await client.request(route.method.toUpperCase(), path, { body: call.body });
        const cell = `${route.method.toUpperCase()} ${route.path} as ${actor}: expected ${expected.status}${expected.code ? ` ${expected.code}` : ''}, got ${response.status} ${response.status >= 400 ? JSON.stringify(response.body) : ''}`;
        cells.push(cell);
        const codeOk = expected.code === undefined || response.body?.error?.code === expected.code;
        if (response.status !== expected.status || !codeOk) failures.push(cell);
      }
    }
    expect(failures).toEqual([]);
    expect(cells).toHaveLength(callable.length * ACTORS.length);
    // Every route x six callers, with fresh fixtures per call: far longer than one request.
  }, 300_000);

  it('really exercises all three refusals and success for organization routes', () => {
    const permissionRoutes = server.routes.filter((r) => r.access.kind === 'permission');
    const outcomes = new Set(permissionRoutes.flatMap((route) => ACTORS.map((actor) => expectedStatus(route, actor).status)));
    expect([...outcomes].sort()).toEqual([200, 201, 204, 401, 403, 404]);
  });
});
