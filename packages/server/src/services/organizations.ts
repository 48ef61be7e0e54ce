import type { DataSource, EntityManager } from 'typeorm';
import type { Membership as ApiMembership, Organization as ApiOrganization, Role } from '@sheaf/engine/api';
import { Membership } from '../entities/Membership';
import { Organization } from '../entities/Organization';
import { recordAudit } from './audit';

/** A URL-friendly form of a name: `Northgate Lifting Ltd.` gives `northgate-lifting-ltd`. */
export function slugify(name: string): string {
  const slug = name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60)
    .replace(/-+$/g, '');
  return slug || 'organization';
}

/** Inserts an organization under the first free slug (`name`, `name-2`, ...). */
export async function insertOrganization(manager: EntityManager, name: string, preferredSlug = slugify(name)): Promise<Organization> {
  for (let attempt = 1; attempt < 1000; attempt += 1) {
    const slug = attempt === 1 ? preferredSlug : `${preferredSlug}-${attempt}`;
    const rows: { id: string }[] = await manager.query(
      `INSERT INTO organizations (name, slug) VALUES ($1, $2) ON CONFLICT (slug) DO NOTHING RETURNING id`,
      [name, slug],
    );
    if (rows[0]) return manager.findOneByOrFail(Organization, { id: rows[0].id });
  }
  throw new Error(`no free slug for organization "${name}"`);
}

/** Creates an organization with its creator as the first owner. */
export async function createOrganization(
  dataSource: DataSource,
  name: string,
  ownerUserId: string,
  ip?: string,
): Promise<ApiOrganization> {
  return dataSource.transaction(async (manager) => {
    const organization = await insertOrganization(manager, name);
    await manager.insert(Membership, { organizationId: organization.id, userId: ownerUserId, role: 'owner' });
    await recordAudit(manager, {
      action: 'organization.created',
      actorUserId: ownerUserId,
      organizationId: organization.id,
      subject: organization.slug,
      ip,
    });
    return { id: organization.id, name: organization.name, slug: organization.slug, role: 'owner' };
  });
}

/** The organizations a user belongs to, with the user's role in each, by name. */
export async function membershipsOf(dataSource: DataSource, userId: string): Promise<ApiMembership[]> {
  const rows: { id: string; name: string; slug: string; role: Role }[] = await dataSource.query(
    `SELECT o.id, o.name, o.slug, m.role
       FROM memberships m JOIN organizations o ON o.id = m.organization_id
      WHERE m.user_id = $1
      ORDER BY lower(o.name), o.id`,
    [userId],
  );
  return rows.map((r) => ({ organization: { id: r.id, name: r.name, slug: r.slug }, role: r.role }));
}
