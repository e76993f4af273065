import { describe, expect, it } from 'vitest';
import { confirmationFor, displayName, roleChoices, roleNowMessage } from './roles';

// Which changes are asked about first is our own rule (common practice, no source):
// anything that takes rights away from someone.
const tobias = { name: 'Tobias Wrenfield', email: 'tobias@example.test' };

describe('the role select', () => {
  it('offers the three staff roles, then taking access away (back to a customer)', () => {
    expect(roleChoices.map((choice) => [choice.value, choice.label])).toEqual([
      ['counter', 'Counter'],
      ['baker', 'Baker'],
      ['owner', 'Owner'],
      ['customer', 'Remove staff access'],
    ]);
  });
});

describe('changes asked about first', () => {
  it('removing anyone’s access', () => {
    for (const role of ['counter', 'baker', 'owner'] as const) {
      expect(confirmationFor({ ...tobias, role }, 'customer')?.action).toBe('Remove access');
    }
    expect(confirmationFor({ ...tobias, role: 'baker' }, 'customer')?.question).toMatch(/^Remove staff access for Tobias Wrenfield\?/);
  });

  it('an owner becoming counter or baker', () => {
    expect(confirmationFor({ ...tobias, role: 'owner' }, 'baker')).toEqual({
      question:
        'Make Tobias Wrenfield a baker? They will no longer be an owner, so they lose the setup pages, staff, sales and refunds.',
      action: 'Make baker',
    });
    expect(confirmationFor({ ...tobias, role: 'owner' }, 'counter')?.action).toBe('Make counter');
  });

  it('not a promotion, a move between counter and baker, or no change', () => {
    expect(confirmationFor({ ...tobias, role: 'counter' }, 'owner')).toBeNull();
    expect(confirmationFor({ ...tobias, role: 'baker' }, 'counter')).toBeNull();
    expect(confirmationFor({ ...tobias, role: 'owner' }, 'owner')).toBeNull();
  });
});

describe('how people are named', () => {
  it('by name, or by address when they have none', () => {
    expect(displayName(tobias)).toBe('Tobias Wrenfield');
    expect(displayName({ name: '  ', email: 'new.helper@example.test' })).toBe('new.helper@example.test');
  });

  it('says when a new role takes effect: now, or at their first sign-in', () => {
    expect(roleNowMessage({ id: '1', ...tobias, role: 'baker', signedIn: true })).toBe(
      'Tobias Wrenfield is now a baker. They can open the staff pages now.',
    );
    expect(roleNowMessage({ id: '3', ...tobias, role: 'owner', signedIn: true })).toMatch(/^Tobias Wrenfield is now an owner\./);
    expect(roleNowMessage({ id: '2', name: '', email: 'new.helper@example.test', role: 'counter', signedIn: false })).toBe(
      'new.helper@example.test is now a counter. We have e-mailed new.helper@example.test an invitation; the role takes effect when they first sign in with it.',
    );
  });
});
