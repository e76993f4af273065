import { Op } from 'sequelize';
import type { Me, StaffMemberInput, StaffMemberView } from '@fryline/schemas';
import { database } from '../../db/sequelize.js';
import { User } from '../../db/models/index.js';
import { AppError, notFound } from '../../lib/app-error.js';
import { audit } from '../audit/audit.js';
import { forgetMe } from './users.js';
import { queueStaffInvitation } from './invitations.js';

const toMember = (u: User): StaffMemberView => ({ id: u.id, email: u.email, name: u.name, role: u.role as StaffMemberView['role'], signedIn: u.googleSub !== null });

export async function listStaff(): Promise<StaffMemberView[]> {
  const users = await User.findAll({ where: { role: { [Op.ne]: 'customer' } }, order: [['role', 'DESC'], ['name', 'ASC']] });
  return users.map(toMember);
}

/**
 * Gives an address a staff role and e-mails them an invitation with the
 * sign-in link (through the outbox). An existing account keeps its identity;
 * a new address is linked to whoever first signs in with it, verified.
 */
export async function addStaff(owner: Me, input: StaffMemberInput): Promise<StaffMemberView> {
  const member = await database().transaction(async (transaction) => {
    const existing = await User.findOne({ where: { email: { [Op.iLike]: input.email } }, transaction, lock: transaction.LOCK.UPDATE });
    const roleBefore = existing?.role;
    const user = existing
      ? await existing.update({ role: input.role, name: existing.name || input.name }, { transaction })
      : await User.create({ email: input.email, name: input.name, role: input.role, googleSub: null, emailVerified: false }, { transaction });
    await audit({ actorId: owner.id, action: 'staff.role', subjectType: 'user', subjectId: user.id, details: { role: input.role } }, transaction);
    // the invitation goes out when the role is new to them (adding them twice sends it once)
    if (roleBefore !== input.role) await queueStaffInvitation(owner, user, input.role, transaction);
    return toMember(user);
  });
  // the signed-in user is read through the read cache: this process sees the new role at once
  forgetMe(member.id);
  return member;
}

/** Changes someone's role (back to customer removes staff rights). The shop always keeps an owner. */
export async function changeRole(owner: Me, userId: string, role: Me['role']): Promise<StaffMemberView | null> {
  const member = await database().transaction(async (transaction) => {
    await database().query('SELECT pg_advisory_xact_lock(4242003)', { transaction });
    const user = await User.findByPk(userId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!user) throw notFound('Person');
    if (user.role === 'owner' && role !== 'owner') {
      if (user.id === owner.id) throw new AppError('own_role', "You can't take away your own owner role; ask another owner", 409);
      const owners = await User.count({ where: { role: 'owner' }, transaction });
      if (owners <= 1) throw new AppError('last_owner', 'The shop needs at least one owner', 409);
    }
    await user.update({ role }, { transaction });
    await audit({ actorId: owner.id, action: 'staff.role', subjectType: 'user', subjectId: user.id, details: { role } }, transaction);
    return role === 'customer' ? null : toMember(user);
  });
  forgetMe(userId);
  return member;
}
