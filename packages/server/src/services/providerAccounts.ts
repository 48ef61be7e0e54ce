import type { DataSource } from 'typeorm';
import { Identity } from '../entities/Identity';
import { User } from '../entities/User';
import { endSessionsOf, normalizeEmail } from './accounts';
import { recordAudit } from './audit';

/** What Sheaf needs from a provider's profile. */
export interface ProviderProfile {
  provider: 'github';
  providerUserId: string;
  login: string | null;
  name: string | null;
  emails: { email: string; primary: boolean; verified: boolean }[];
}

/** A sign-in the provider vouched for but Sheaf refuses, with the reason to show. */
export class ProviderSignInRefused extends Error {
  override name = 'ProviderSignInRefused';

  constructor(readonly reason: 'no-verified-email') {
    super('the provider account has no verified e-mail address');
  }
}

export interface ProviderSignIn {
  user: User;
  outcome: 'known' | 'linked' | 'created';
}

/**
 * Finds or makes the Sheaf user for a provider identity:
 * 1. an identity already linked signs that user in;
 * 2. otherwise a user with the same *verified* provider e-mail gets the identity linked;
 * 3. otherwise a new user is created from the primary verified e-mail.
 * A provider account without a verified e-mail is refused.
 *
 * When step 2 links to an account whose address nobody had proven, whoever registered it may not
 * own it (someone can sign up with another person's address and wait). The provider has now
 * proven it, so that account's password is cleared and its sessions ended: the owner can set a
 * new password through a reset link.
 */
export async function signInWithProvider(dataSource: DataSource, profile: ProviderProfile, ip?: string): Promise<ProviderSignIn> {
  const verified = profile.emails
    .filter((e) => e.verified)
    .sort((a, b) => Number(b.primary) - Number(a.primary))
    .map((e) => normalizeEmail(e.email));

  return dataSource.transaction(async (manager) => {
    const identity = await manager.findOneBy(Identity, { provider: profile.provider, providerUserId: profile.providerUserId });
    if (identity) {
      await manager.update(Identity, { id: identity.id }, { login: profile.login, email: verified[0] ?? identity.email });
      return { user: await manager.findOneByOrFail(User, { id: identity.userId }), outcome: 'known' as const };
    }
    if (verified.length === 0) throw new ProviderSignInRefused('no-verified-email');

    let user: User | null = null;
    for (const email of verified) {
      user = await manager.findOne(User, { where: { email }, lock: { mode: 'pessimistic_write' } });
      if (user) break;
    }
    let outcome: 'linked' | 'created';
    if (user) {
      outcome = 'linked';
      if (!user.emailVerifiedAt) {
        await manager.update(User, { id: user.id }, { emailVerifiedAt: new Date(), passwordHash: null });
        await endSessionsOf(manager, user.id);
      }
    } else {
      outcome = 'created';
      const email = verified[0] as string;
      const name = (profile.name ?? profile.login ?? email.split('@')[0] ?? 'New user').slice(0, 120);
      const inserted = await manager.insert(User, { email, name, passwordHash: null, emailVerifiedAt: new Date() });
      user = await manager.findOneByOrFail(User, { id: inserted.identifiers[0]?.id as string });
    }
    await manager.insert(Identity, {
      userId: user.id,
      provider: profile.provider,
      providerUserId: profile.providerUserId,
      login: profile.login,
      email: verified[0] ?? null,
    });
    await recordAudit(manager, {
      action: outcome === 'linked' ? 'auth.identity-linked' : 'auth.signup',
      actorUserId: user.id,
      subject: user.email,
      ip,
      details: { provider: profile.provider, login: profile.login },
    });
    return { user: await manager.findOneByOrFail(User, { id: user.id }), outcome };
  });
}
