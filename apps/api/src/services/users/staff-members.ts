import { Op } from 'sequelize';
import type { Me, StaffMemberInput, StaffMemberView } from '@fryline/schemas';
import { database } from '../../db/sequelize.js';
import { User } from '../../db/models/index.js';
import { AppError, notFound } from '../../lib/app-error.js';
import { audit } from '../audit/audit.js';

const toMember = (u: User): StaffMemberView => ({ id: u.id, email: u.email, name: u.name, role: u.role as StaffMemberView['role'], signedIn: u.googleSub !== null });

export async function listStaff(): Promise<StaffMemberView[]> {
  const users = await User.findAll({ where: { role: { [Op.ne]: 'customer' } }, order: [['role', 'DESC'], ['name', 'ASC']] });
  return users.map(toMember);
}

/**
 * Gives an address a staff role. An existing account keeps its identity; a
 * new address is linked to whoever first signs in with it, verified.
 */
export async function addStaff(owner: Me, input: StaffMemberInput): Promise<StaffMemberView> {
  return database().transaction(async (transaction) => {
    const existing = await User.findOne({ where: { email: { [Op.iLike]: input.email } }, transaction, lock: transaction.LOCK.UPDATE });
    const user = existing
      ? await existing.update({ role: input.role, name: existing.name || input.name }, { transaction })
      : await User.create({ email: input.email, name: input.name, role: input.role, googleSub: null, emailVerified: false }, { transaction });
    await audit({ actorId: owner.id, action: 'staff.role', subjectType: 'user', subjectId: user.id, details: { role: input.role } }, transaction);
    return toMember(user);
  });
}

/** Changes someone's role (back to customer removes staff rights). The shop always keeps an owner. */
export async function changeRole(owner: Me, userId: string, role: Me['role']): Promise<StaffMemberView | null> {
  return database().transaction(async (transaction) => {
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
}
