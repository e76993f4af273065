import { describe, expect, it } from 'vitest';
import { AuditEntry, OutboxMessage, User } from '../src/db/models/index.js';
import { useStack, Browser, signIn } from './support.js';
import { signedInAgent } from './owner-helpers.js';
import { deliverMail } from './order-helpers.js';

const stack = useStack();

describe('inviting staff', () => {
  it('e-mails the invitation with a sign-in link through the outbox; the link signs them into the staff pages', async () => {
    const owner = await signedInAgent(stack, 'owner@fryline.test');
    const added = await owner.post('/api/staff/members').send({ email: 'wren.aldous@example.test', name: 'Wren Aldous', role: 'baker' });
    expect(added.status).toBe(201);
    const queued = await OutboxMessage.findAll({ where: { kind: 'staff-invitation' } });
    expect(queued).toHaveLength(1);
    expect(queued[0]).toMatchObject({ toAddress: 'wren.aldous@example.test', status: 'pending' });

    expect(await deliverMail(stack)).toMatchObject({ failed: 0 });
    const list = (await (await fetch(`${stack.mail.url}/api/messages`)).json()) as any[];
    const mail = list.find((m) => m.to.includes('wren.aldous@example.test'));
    const detail = (await (await fetch(`${stack.mail.url}/api/messages/${mail.id}`)).json()) as any;
    expect(detail.subject).toMatch(/invited/);
    expect(detail.text).toMatch(/as a baker/);
    const link = /(http\S+\/auth\/google\S*)/.exec(detail.text)![1]!;
    expect(new URL(link).searchParams.get('returnTo')).toBe('/staff/');

    // following the link: the usual sign-in, then back to the staff pages with the role
    const wren = new Browser(stack.url);
    const done = await signIn(wren, 'wren.aldous@example.test', { returnTo: new URL(link).searchParams.get('returnTo')! });
    expect(done.location).toBe('/staff/');
    expect((await wren.getJson('/api/me')).body.role).toBe('baker');
    expect(await AuditEntry.count({ where: { action: 'staff.invited' } })).toBe(1);
  });

  it('sends one invitation when the same person is added twice, and can send it again on request', async () => {
    const owner = await signedInAgent(stack, 'owner@fryline.test');
    const body = { email: 'ash.penrose@example.test', name: '', role: 'counter' };
    const first = await owner.post('/api/staff/members').send(body);
    await owner.post('/api/staff/members').send(body).expect(201);
    expect(await OutboxMessage.count({ where: { kind: 'staff-invitation' } })).toBe(1);
    await owner.post(`/api/staff/members/${first.body.id}/invitation`).expect(202);
    expect(await OutboxMessage.count({ where: { kind: 'staff-invitation', toAddress: 'ash.penrose@example.test' } })).toBe(2);
    // someone who has signed in needs no invitation
    await signIn(new Browser(stack.url), 'baker@fryline.test');
    const baker = await User.findOne({ where: { email: 'baker@fryline.test' } });
    const signedIn = await owner.post(`/api/staff/members/${baker!.id}/invitation`);
    expect(signedIn.status).toBe(409);
  });

  it('keeps the last owner: the only owner cannot be removed', async () => {
    const owner = await signedInAgent(stack, 'owner@fryline.test');
    const other = await owner.post('/api/staff/members').send({ email: 'second.owner@example.test', name: 'Second', role: 'owner' });
    const second = new Browser(stack.url);
    await signIn(second, 'second.owner@example.test');
    const me = await owner.get('/api/me');
    // the second owner removes the first; then nobody may remove the second, the last owner
    const removed = await second.send('PATCH', `/api/staff/members/${me.body.id}`, { role: 'customer' });
    expect(removed.status).toBe(204);
    const last = await second.send('PATCH', `/api/staff/members/${other.body.id}`, { role: 'baker' });
    expect(last.status).toBe(409);
    expect(await User.count({ where: { role: 'owner' } })).toBe(1);
  });

  it('lets only the owner invite', async () => {
    const baker = await signedInAgent(stack, 'baker@fryline.test');
    expect((await baker.post('/api/staff/members').send({ email: 'x@example.test', role: 'counter' })).status).toBe(403);
    expect(await OutboxMessage.count({ where: { kind: 'staff-invitation' } })).toBe(0);
  });
});
