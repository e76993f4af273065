import { createHash } from 'node:crypto';

export interface DemoAccount {
  sub: string;
  email: string;
  name: string;
  /** Shown as a hint on the chooser; the app decides the real role. */
  role: string;
}

/** Fictional people, one for each role the app knows. Their subs never change. */
export const DEMO_ACCOUNTS: readonly DemoAccount[] = Object.freeze([
  { sub: '100000000000000000001', email: 'owner@fryline.test', name: 'Marisol Quenby', role: 'Owner: setup and weekly sales' },
  { sub: '100000000000000000002', email: 'baker@fryline.test', name: 'Tobias Wrenfield', role: 'Baker: night-before production sheet' },
  { sub: '100000000000000000003', email: 'counter@fryline.test', name: 'Priya Halloway', role: 'Counter: pickup list' },
  { sub: '100000000000000000004', email: 'customer@fryline.test', name: 'Dana Ostrander', role: 'Customer: pre-orders' },
]);

export interface Person {
  sub: string;
  email: string;
  name: string;
}

const EMAIL = /^[^\s@<>()",;:]+@[^\s@<>()",;:]+\.[^\s@<>()",;:]+$/;

export function normaliseEmail(raw: string): string | null {
  const email = raw.trim().toLowerCase();
  return email.length <= 254 && EMAIL.test(email) ? email : null;
}

/**
 * Stable subject id for an address: the same address always gets the same
 * 21-digit id, shaped like the numeric ids the hosted service hands out.
 * Demo addresses keep their fixed ids.
 */
export function subForEmail(email: string): string {
  const demo = DEMO_ACCOUNTS.find((a) => a.email === email);
  if (demo) return demo.sub;
  const digest = createHash('sha256').update(`fryline-fake-oauth:${email}`).digest('hex');
  const digits = (BigInt(`0x${digest}`) % 10n ** 20n).toString().padStart(20, '0');
  return `1${digits}`;
}

/** "sam.o-neil@x" → "Sam O-neil": a readable default when no name is given. */
export function nameFromEmail(email: string): string {
  const local = email.split('@')[0] ?? email;
  const words = local.split(/[._+]+/).filter(Boolean);
  return words.map((w) => w.charAt(0).toUpperCase() + w.slice(1)).join(' ') || local;
}

export function splitName(name: string): { given_name: string; family_name: string } {
  const parts = name.trim().split(/\s+/);
  if (parts.length < 2) return { given_name: parts[0] ?? '', family_name: '' };
  return { given_name: parts.slice(0, -1).join(' '), family_name: parts[parts.length - 1] ?? '' };
}

/** People who signed in, by sub. The latest name given for an address wins. */
export class PeopleDirectory {
  private readonly bySub = new Map<string, Person>();

  constructor() {
    for (const a of DEMO_ACCOUNTS) this.bySub.set(a.sub, { sub: a.sub, email: a.email, name: a.name });
  }

  signIn(email: string, name: string | undefined): Person {
    const sub = subForEmail(email);
    const known = this.bySub.get(sub);
    const person: Person = { sub, email, name: name || known?.name || nameFromEmail(email) };
    this.bySub.set(sub, person);
    return person;
  }

  get(sub: string): Person | undefined {
    return this.bySub.get(sub);
  }
}
