import { randomUUID } from 'node:crypto';
import type { DataSource } from 'typeorm';
import type { DevMailMessage, Role } from '@sheaf/engine/api';
import { Membership } from '../../src/entities/Membership';
import { Project } from '../../src/entities/Project';
import { Sheet } from '../../src/entities/Sheet';
import { User } from '../../src/entities/User';
import { hashPassword } from '../../src/services/passwords';
import { insertOrganization } from '../../src/services/organizations';
import { createSheet } from '../../src/services/sheets';
import { newToken } from '../../src/services/tokens';
import { Invitation } from '../../src/entities/Invitation';
import type { TestClient } from './TestClient';
import type { TestServer } from './testServer';

export const TEST_PASSWORD = 'correct horse battery';

/** A unique address on the test domain. */
export function uniqueEmail(label = 'user'): string {
  return `${label}-${randomUUID().slice(0, 8)}@test.sheaf.test`;
}

export interface TestUser {
  id: string;
  email: string;
  name: string;
  password: string;
}

/** A password account written straight to the database (faster than signing up through the API). */
export async function createUser(dataSource: DataSource, label = 'user', options: { verified?: boolean } = {}): Promise<TestUser> {
  const email = uniqueEmail(label);
  const name = `Test ${label}`;
  // One argon2 hash of the shared test password serves every fixture account.
  testPasswordHash ??= hashPassword(TEST_PASSWORD);
  const rows: { id: string }[] = await dataSource.query(
    `INSERT INTO users (email, name, password_hash, email_verified_at) VALUES ($1, $2, $3, CASE WHEN $4::boolean THEN now() END) RETURNING id`,
    [email, name, await testPasswordHash, options.verified === true],
  );
  return { id: (rows[0] as { id: string }).id, email, name, password: TEST_PASSWORD };
}

let testPasswordHash: Promise<string> | undefined;

export async function addMember(dataSource: DataSource, organizationId: string, userId: string, role: Role): Promise<void> {
  await dataSource.getRepository(Membership).insert({ organizationId, userId, role });
}

/** The five kinds of caller of an organization's routes. */
export const ACTORS = ['anonymous', 'outsider', 'viewer', 'checker', 'engineer', 'owner'] as const;
export type Actor = (typeof ACTORS)[number];

export interface Team {
  organizationId: string;
  organizationName: string;
  users: Record<Exclude<Actor, 'anonymous'>, TestUser>;
  project: Project;
  sheet: Sheet;
}

/** An organization with one member per role, a project with one sheet, and a signed-up outsider. */
export async function createTeam(dataSource: DataSource, label = 'team'): Promise<Team> {
  const organization = await insertOrganization(dataSource.manager, `Test ${label} ${randomUUID().slice(0, 6)}`);
  const users = {
    owner: await createUser(dataSource, `${label}-owner`),
    engineer: await createUser(dataSource, `${label}-engineer`),
    checker: await createUser(dataSource, `${label}-checker`),
    viewer: await createUser(dataSource, `${label}-viewer`),
    outsider: await createUser(dataSource, `${label}-outsider`),
  };
  for (const role of ['owner', 'engineer', 'checker', 'viewer'] as const) {
    await addMember(dataSource, organization.id, users[role].id, role);
  }
  const project = await createProjectIn(dataSource, organization.id);
  const sheet = await createSheetIn(dataSource, project, users.engineer.id);
  return { organizationId: organization.id, organizationName: organization.name, users, project, sheet };
}

export async function createProjectIn(dataSource: DataSource, organizationId: string, code = `P${randomUUID().slice(0, 6).toUpperCase()}`): Promise<Project> {
  const inserted = await dataSource.getRepository(Project).insert({ organizationId, name: `Project ${code}`, code });
  return dataSource.getRepository(Project).findOneByOrFail({ id: inserted.identifiers[0]?.id as string });
}

export async function createSheetIn(dataSource: DataSource, project: Project, userId: string, title = 'Lug bearing check'): Promise<Sheet> {
  const detail = await createSheet(dataSource, project, { title, createdByUserId: userId });
  return dataSource.getRepository(Sheet).findOneByOrFail({ id: detail.id });
}

/** An invitation row with a known token (the API only ever mails it). */
export async function createInvitation(
  dataSource: DataSource,
  input: { organizationId: string; email: string; role: Role; expiresInMs?: number },
): Promise<string> {
  const { token, tokenHash } = newToken();
  await dataSource.getRepository(Invitation).insert({
    organizationId: input.organizationId,
    email: input.email.toLowerCase(),
    role: input.role,
    tokenHash,
    expiresAt: new Date(Date.now() + (input.expiresInMs ?? 3600_000)),
  });
  return token;
}

/** A client signed in as the user. */
export async function signedInClient(server: TestServer, user: TestUser): Promise<TestClient> {
  const client = server.client();
  await client.signIn(user.email, user.password);
  return client;
}

/** A client for one of the actors of a team (anonymous: a fresh client that never signed in). */
export async function signInAs(server: TestServer, team: Team, actor: Actor): Promise<TestClient> {
  if (actor === 'anonymous') return server.client();
  return signedInClient(server, team.users[actor]);
}

/**
 * Waits for a message to `to` to reach the fake SMTP, read through GET /api/dev/mail as the
 * web app's developers would. Mail sent in the background may take a moment.
 */
export async function waitForMail(
  client: TestClient,
  to: string,
  predicate: (message: DevMailMessage) => boolean = () => true,
  timeoutMs = 10_000,
): Promise<DevMailMessage> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const response = await client.get<{ messages: DevMailMessage[] }>('/api/dev/mail');
    const found = response.body.messages.find((m) => m.to.toLowerCase().includes(to.toLowerCase()) && predicate(m));
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`no mail to ${to} within ${timeoutMs} ms`);
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}

/** The first link in a mail's text that contains `marker` (e.g. `/invite/`). */
export function linkIn(message: DevMailMessage, marker: string): string {
  const link = message.text.match(/https?:\/\/\S+/g)?.find((url) => url.includes(marker));
  if (!link) throw new Error(`no ${marker} link in mail "${message.subject}": ${message.text}`);
  return link;
}

export async function userRow(dataSource: DataSource, id: string): Promise<User> {
  return dataSource.getRepository(User).findOneByOrFail({ id });
}
