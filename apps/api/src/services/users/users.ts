import { Op } from 'sequelize';
import type { Me } from '@fryline/schemas';
import { database } from '../../db/sequelize.js';
import { User } from '../../db/models/index.js';
import { AppError } from '../../lib/app-error.js';
import { enqueueMail } from '../mail/outbox.js';
import { welcomeMail } from '../mail/templates.js';
import { shopSettings } from '../shop/settings.js';
import { audit } from '../audit/audit.js';

export interface ProviderProfile {
  sub: string;
  email: string;
  emailVerified: boolean;
  name: string;
}

export const toMe = (user: User): Me => ({ id: user.id, email: user.email, name: user.name, role: user.role });

/**
 * Finds or creates the account for a provider identity. Accounts are keyed by
 * the provider's `sub`. A staff account the owner set up by address (no sub
 * yet) is linked only when the provider says the address is verified. An
 * unknown identity becomes a new customer and gets a welcome e-mail, queued
 * in the same transaction.
 */
export async function signIn(profile: ProviderProfile, shopUrl: string): Promise<Me> {
  return database().transaction(async (transaction) => {
    const bySub = await User.findOne({ where: { googleSub: profile.sub }, transaction, lock: transaction.LOCK.UPDATE });
    if (bySub) {
      await bySub.update({ name: bySub.name || profile.name, emailVerified: profile.emailVerified }, { transaction });
      return toMe(bySub);
    }
    const byEmail = await User.findOne({
      where: { email: { [Op.iLike]: profile.email } },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (byEmail) {
      if (byEmail.googleSub || !profile.emailVerified) {
        throw new AppError('account_conflict', 'This address belongs to another account', 409);
      }
      await byEmail.update({ googleSub: profile.sub, emailVerified: true, name: byEmail.name || profile.name }, { transaction });
      await audit({ actorId: byEmail.id, action: 'account.linked', subjectType: 'user', subjectId: byEmail.id }, transaction);
      return toMe(byEmail);
    }
    const user = await User.create(
      { googleSub: profile.sub, email: profile.email, emailVerified: profile.emailVerified, name: profile.name, role: 'customer' },
      { transaction },
    );
    const settings = await shopSettings(transaction);
    const mail = welcomeMail(user.name, settings.shopName, shopUrl);
    await enqueueMail({ kind: 'welcome', to: user.email, ...mail, dedupeKey: `welcome:${user.id}` }, transaction);
    await audit({ actorId: user.id, action: 'account.created', subjectType: 'user', subjectId: user.id }, transaction);
    return toMe(user);
  });
}

export async function findMe(id: string): Promise<Me | null> {
  const user = await User.findByPk(id);
  return user ? toMe(user) : null;
}
