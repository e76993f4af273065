import { describe, expect, it } from 'vitest';
import type { PickupRow } from '@fryline/schemas';
import { groupByWindow, matchesSearch, restForNoShow, rowState, undoSecondsLeft, withPending } from './pickups';

const T = Date.parse('2030-06-01T16:00:00Z');
const min = (n: number) => new Date(T + n * 60_000).toISOString();
const windows = [
  { id: 'w1', startsAt: min(-150), endsAt: min(-90) },
  { id: 'w2', startsAt: min(-30), endsAt: min(30) },
  { id: 'w3', startsAt: min(30), endsAt: min(90) },
];
const row = (orderId: string, windowId: string, extra: Partial<PickupRow> = {}): PickupRow => {
  const w = windows.find((x) => x.id === windowId)!;
  return {
    orderId, name: `Person ${orderId}`, pickupCode: 'DJ7KMN', windowId, status: 'paid', boxes: [], rings: 6, holes: 0,
    window: { startsAt: w.startsAt, endsAt: w.endsAt }, noShowFrom: new Date(Date.parse(w.endsAt) + 30 * 60_000).toISOString(),
    late: false, collectedAt: null, collectedBy: null, undoUntil: null, noShowAt: null, noShowBy: null, ...extra,
  };
};

describe('the pickup list', () => {
  it('puts the window under way first, then those to come, then those over; totals per window', () => {
    const rows = withPending([row('a', 'w1'), row('b', 'w2'), row('c', 'w2', { status: 'collected' }), row('d', 'w3')], []);
    const groups = groupByWindow(windows, rows, T);
    expect(groups.map((g) => [g.window.id, g.when])).toEqual([['w2', 'now'], ['w3', 'later'], ['w1', 'over']]);
    expect(groups[0]!.totals).toEqual({ toHandOver: 1, handedOver: 1, noShows: 0 });
  });
  it('between windows the next one comes first', () => {
    expect(groupByWindow(windows, [], Date.parse(min(-60)))[0]!.window.id).toBe('w2');
  });
  it('says late after the window and may-no-show after the grace, in words', () => {
    expect(rowState(row('a', 'w2'), T)).toBe('waiting');
    expect(rowState(row('a', 'w1'), Date.parse(min(-80)))).toBe('late');
    expect(rowState(row('a', 'w1'), T)).toBe('may-no-show');
    expect(restForNoShow(withPending([row('a', 'w1'), row('b', 'w2')], []), T).map((r) => r.orderId)).toEqual(['a']);
  });
  it('shows this device’s waiting changes over the server rows, in order', () => {
    const at = min(0);
    const shown = withPending([row('a', 'w2'), row('b', 'w2')], [
      { action: 'collect', orderId: 'a', at, by: 'Priya' },
      { action: 'collect', orderId: 'b', at, by: 'Priya' },
      { action: 'uncollect', orderId: 'b', at, by: 'Priya' },
    ]);
    expect(shown.map((r) => [r.orderId, r.status, r.waiting])).toEqual([['a', 'collected', true], ['b', 'paid', true]]);
    expect(undoSecondsLeft(shown[0]!, T + 3_000)).toBe(12);
    expect(undoSecondsLeft(shown[0]!, T + 16_000)).toBe(0);
  });
  it('finds by any part of the name or the code, look-alikes forgiven', () => {
    const r = row('a', 'w2', { name: 'Zoë Ångström' });
    expect(matchesSearch(r, 'zoe ang')).toBe(true);
    expect(matchesSearch(r, 'oi2')).toBe(true); // D J 7
    expect(matchesSearch(r, 'kmx')).toBe(false);
    expect(matchesSearch(r, '')).toBe(true);
  });
});
