import crypto from 'node:crypto';
import type { Transaction } from 'sequelize';
import type { Me, Role } from '@fryline/schemas';
import { database } from '../../db/sequelize.js';
import { User } from '../../db/models/index.js';
import { AppError, notFound } from '../../lib/app-error.js';
import { enqueueMail } from '../mail/outbox.js';
import { mailShopOf, renderMail } from '../mail/templates.js';
import { shopSettings } from '../shop/settings.js';
import { context } from '../../integrations/context.js';
import { audit } from '../audit/audit.js';

const roleWork: Record<Exclude<Role, 'customer'>, string> = {
  counter: 'run the counter on bake days: find orders, hand them over and sell what is left',
  baker: 'open the production sheet and the formula, and run the counter',
  owner: 'set up bake days, the menu, equipment, staff and settings, give refunds and read the sales',
};

/** Where the invitation's link leads: the usual sign-in, then the staff pages. */
export const staffSignInUrl = () => `${context().config.publicUrl}/auth/google?returnTo=${encodeURIComponent('/staff/')}`;

/**
 * Queues the e-mail that tells someone they have a staff role, with the
 * sign-in link, in the transaction that gives the role.
 */
export async function queueStaffInvitation(
  owner: Me,
  user: Pick<User, 'id' | 'email' | 'name'>,
  role: Exclude<Role, 'customer'>,
  transaction: Transaction,
): Promise<void> {
  const settings = await shopSettings(transaction);
  const { shopName } = settings;
  const article = role === 'owner' ? 'an' : 'a';
  const mail = await renderMail({
    subject: `You're invited to the ${shopName} staff pages`,
    shop: mailShopOf(settings),
    preview: `${owner.name || owner.email} has added you to the ${shopName} staff as ${article} ${role}.`,
    blocks: [
      { type: 'paragraph', text: `Hello ${user.name || 'there'},` },
      { type: 'paragraph', text: `${owner.name || owner.email} has added you to the ${shopName} staff as ${article} ${role}. You can ${roleWork[role]}.` },
      { type: 'paragraph', text: `Sign in with this address (${user.email}) here: ${staffSignInUrl()}` },
      { type: 'button', label: 'Sign in to the staff pages', href: staffSignInUrl() },
      { type: 'paragraph', text: `If you weren't expecting this, you can ignore this e-mail: nothing changes until you sign in.` },
    ],
  });
  await enqueueMail(
    { kind: 'staff-invitation', to: user.email, ...mail, dedupeKey: `staff-invitation:${user.id}:${crypto.randomUUID()}` },
    transaction,
  );
  await audit({ actorId: owner.id, action: 'staff.invited', subjectType: 'user', subjectId: user.id, details: { email: user.email, role } }, transaction);
}

/** Sends the invitation again, for someone with a staff role who has not signed in yet. */
export async function resendInvitation(owner: Me, userId: string): Promise<void> {
  await database().transaction(async (transaction) => {
    const user = await User.findByPk(userId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!user || user.role === 'customer') throw notFound('Staff member');
    if (user.googleSub) throw new AppError('already_signed_in', `${user.name || user.email} has already signed in; no invitation is needed`, 409);
    await queueStaffInvitation(owner, user, user.role, transaction);
  });
}
