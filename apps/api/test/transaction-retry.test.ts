import { describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { database } from '../src/db/sequelize.js';
import { isTransactionConflict, transactionWithRetry } from '../src/db/retry.js';
import { BakeDay, PickupWindow } from '../src/db/models/index.js';
import { useStack } from './support.js';

useStack();

/** Resolves once `n` callers are waiting: both transactions hold their first lock before either asks for its second. */
function barrier(n: number) {
  let waiting = 0;
  let release!: () => void;
  const all = new Promise<void>((resolve) => (release = resolve));
  return async () => {
    waiting += 1;
    if (waiting === n) release();
    await all;
  };
}

describe('a transaction PostgreSQL ends as a deadlock is run again', () => {
  it('two transactions that lock a day and a window in opposite orders both finish, one of them on a second try', async () => {
    const { id: dayId } = await BakeDay.findOne({ where: { status: 'published' } }).then((d) => d!);
    const window = (await PickupWindow.findOne({ where: { bakeDayId: dayId } }))!;
    const bothLocked = barrier(2);
    const tries = { a: 0, b: 0 };
    const lockDay = (t: any) => database().query('SELECT id FROM bake_days WHERE id = :dayId FOR UPDATE', { replacements: { dayId }, transaction: t, type: QueryTypes.SELECT });
    const lockWindow = (t: any) => database().query('SELECT id FROM pickup_windows WHERE id = :id FOR UPDATE', { replacements: { id: window.id }, transaction: t, type: QueryTypes.SELECT });
    const a = transactionWithRetry(async (t) => {
      tries.a += 1;
      await lockDay(t);
      if (tries.a === 1) await bothLocked();
      await lockWindow(t);
      return 'a';
    });
    const b = transactionWithRetry(async (t) => {
      tries.b += 1;
      await lockWindow(t);
      if (tries.b === 1) await bothLocked();
      await lockDay(t);
      return 'b';
    });
    // PostgreSQL's deadlock detector (deadlock_timeout, 1 s by default) ends one of them with 40P01
    expect(await Promise.all([a, b])).toEqual(['a', 'b']);
    expect(tries.a + tries.b).toBe(3);
  });

  it('gives up after its tries, and leaves other errors alone', async () => {
    let tries = 0;
    const conflict = Object.assign(new Error('deadlock detected'), { parent: { code: '40P01' } });
    await expect(transactionWithRetry(async () => { tries += 1; throw conflict; }, 3)).rejects.toBe(conflict);
    expect(tries).toBe(3);
    tries = 0;
    await expect(transactionWithRetry(async () => { tries += 1; throw new Error('not a conflict'); })).rejects.toThrow('not a conflict');
    expect(tries).toBe(1);
    expect(isTransactionConflict({ parent: { code: '40001' } })).toBe(true);
    expect(isTransactionConflict({ parent: { code: '23505' } })).toBe(false);
  });
});
