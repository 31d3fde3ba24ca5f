import { randomUUID } from 'node:crypto';
import { afterAll, describe, expect, it } from 'vitest';
import { and, eq } from 'drizzle-orm';
import { closeDatabase, db } from '@/db/client';
import { emailOutbox, users } from '@/db/schema';
import { deactivateAccount } from '@/lib/accounts/account-status';
import { changePassword } from '@/lib/accounts/change-password';
import { changeRole } from '@/lib/accounts/change-role';
import { confirmEmail } from '@/lib/accounts/confirm-email';
import { inviteUser } from '@/lib/accounts/invite-user';
import { acceptInvitation, resetPassword } from '@/lib/accounts/set-password-from-link';
import { signUp } from '@/lib/accounts/sign-up';
import { issueToken } from '@/lib/auth/one-time-tokens';
import { verifyPassword } from '@/lib/auth/password';
import { createAccount, readAccount, TEST_PASSWORD, uniqueEmail } from '../support/accounts';

const NEW_PASSWORD = 'a newer lathe phrase';

function signUpInput(email: string) {
  return { role: 'seller', name: 'Ines Harrow', businessName: 'Harrow Spindle Works', town: 'Lowmere', region: 'Brenmark', email, password: TEST_PASSWORD, passwordAgain: TEST_PASSWORD };
}

async function outboxFor(to: string) {
  return db.select({ template: emailOutbox.template, text: emailOutbox.textBody }).from(emailOutbox).where(eq(emailOutbox.toAddress, to));
}

describe('account operations', () => {
  afterAll(closeDatabase);

  it('answers a sign-up for a known address exactly like a new one, and mails the owner instead', async () => {
    const existing = await createAccount('buyer');
    const fresh = uniqueEmail('fresh');
    const known = await signUp.execute(null, signUpInput(existing.email));
    const unknown = await signUp.execute(null, signUpInput(fresh));
    expect(known).toEqual({ ok: true, data: { email: existing.email } });
    expect(unknown).toEqual({ ok: true, data: { email: fresh } });
    expect(await db.select({ id: users.id }).from(users).where(eq(users.email, existing.email))).toHaveLength(1);
    expect((await outboxFor(existing.email)).map((m) => m.template)).toEqual(['account-exists']);
    expect((await outboxFor(fresh)).map((m) => m.template)).toEqual(['verify-email']);
  });

  it('refuses a sixth sign-up for one address within 15 minutes, whether or not it has an account', async () => {
    for (const email of [uniqueEmail('repeat'), (await createAccount('buyer')).email]) {
      const answers = [];
      for (let i = 0; i < 6; i += 1) answers.push(await signUp.execute(null, signUpInput(email)));
      expect(answers.slice(0, 5).every((a) => a.ok)).toBe(true);
      expect(answers[5]).toMatchObject({ ok: false, code: 'rate_limited' });
      // Five mails at most reach the address.
      expect((await outboxFor(email)).length).toBeLessThanOrEqual(5);
    }
  });

  it('refuses the 21st sign-up from one network address within the hour', async () => {
    // A documentation address of this test's own: other tests count attempts from random 198.51.100.x.
    const ip = `2001:db8::${randomUUID().slice(0, 4)}`;
    const answers = [];
    for (let i = 0; i < 21; i += 1) answers.push(await signUp.execute(null, signUpInput(uniqueEmail('bulk')), { ip }));
    expect(answers.slice(0, 20).every((a) => a.ok)).toBe(true);
    expect(answers[20]).toMatchObject({ ok: false, code: 'rate_limited' });
    // Another address is not held up by it.
    await expect(signUp.execute(null, signUpInput(uniqueEmail('other')), { ip: `2001:db8:1::${randomUUID().slice(0, 4)}` })).resolves.toMatchObject({ ok: true });
  });

  it('confirms an address once; the same link a second time is refused', async () => {
    const account = await createAccount('seller', { confirmed: false });
    const token = await issueToken(db, account.id, 'verify_email');
    await expect(confirmEmail.execute(null, { token })).resolves.toMatchObject({ ok: true });
    expect((await readAccount(account.id))!.emailVerified).not.toBeNull();
    await expect(confirmEmail.execute(null, { token })).resolves.toMatchObject({ ok: false, code: 'not_found' });
  });

  it('refuses an expired reset link and keeps the password', async () => {
    const account = await createAccount('dealer');
    const token = await issueToken(db, account.id, 'reset_password', new Date(Date.now() - 2 * 60 * 60_000));
    await expect(resetPassword.execute(null, { token, password: NEW_PASSWORD, passwordAgain: NEW_PASSWORD })).resolves.toMatchObject({ ok: false, code: 'not_found' });
    expect(await verifyPassword(TEST_PASSWORD, (await readAccount(account.id))!.passwordHash)).toBe(true);
  });

  it('sets the new password from a reset link and ends existing sessions', async () => {
    const account = await createAccount('dealer');
    const before = (await readAccount(account.id))!.sessionVersion;
    const token = await issueToken(db, account.id, 'reset_password');
    await expect(resetPassword.execute(null, { token, password: NEW_PASSWORD, passwordAgain: NEW_PASSWORD })).resolves.toMatchObject({ ok: true });
    const after = (await readAccount(account.id))!;
    expect(after.sessionVersion).toBe(before + 1);
    expect(await verifyPassword(NEW_PASSWORD, after.passwordHash)).toBe(true);
  });

  it('makes an earlier reset link useless once a newer one is sent', async () => {
    const account = await createAccount('buyer');
    const older = await issueToken(db, account.id, 'reset_password');
    await issueToken(db, account.id, 'reset_password');
    await expect(resetPassword.execute(null, { token: older, password: NEW_PASSWORD, passwordAgain: NEW_PASSWORD })).resolves.toMatchObject({ ok: false, code: 'not_found' });
  });

  it('invites an inspector who then chooses a password and counts as confirmed', async () => {
    const coordinator = await createAccount('admin');
    const email = uniqueEmail('invitee');
    const invited = await inviteUser.execute(coordinator.actor, { name: 'Oskar Tenwick', email, role: 'inspector' });
    expect(invited.ok).toBe(true);
    const [mail] = await outboxFor(email);
    expect(mail?.template).toBe('invitation');
    const token = new URL(mail!.text.match(/http\S+invitation\S+/)![0]).searchParams.get('token')!;
    await expect(acceptInvitation.execute(null, { token, password: NEW_PASSWORD, passwordAgain: NEW_PASSWORD })).resolves.toMatchObject({ ok: true });
    const [row] = await db.select().from(users).where(and(eq(users.email, email), eq(users.role, 'inspector')));
    expect(row!.emailVerified).not.toBeNull();
    expect(row!.invitedById).toBe(coordinator.id);
  });

  it('refuses to invite an address that already has an account, naming the field', async () => {
    const coordinator = await createAccount('admin');
    const existing = await createAccount('seller');
    const result = await inviteUser.execute(coordinator.actor, { name: 'Someone', email: existing.email, role: 'admin' });
    expect(result).toMatchObject({ ok: false, code: 'invalid_input', fieldErrors: { email: [expect.stringContaining('already has an account')] } });
    expect((await readAccount(existing.id))!.role).toBe('seller');
  });

  it('deactivates an account and moves its session version on', async () => {
    const coordinator = await createAccount('admin');
    const person = await createAccount('buyer');
    await expect(deactivateAccount.execute(coordinator.actor, { userId: person.id })).resolves.toMatchObject({ ok: true });
    const after = (await readAccount(person.id))!;
    expect(after.deactivatedAt).not.toBeNull();
    expect(after.sessionVersion).toBe(1);
  });

  it('keeps coordinators from changing their own role or deactivating themselves', async () => {
    const coordinator = await createAccount('admin');
    await expect(changeRole.execute(coordinator.actor, { userId: coordinator.id, role: 'buyer' })).resolves.toMatchObject({ ok: false, code: 'forbidden' });
    await expect(deactivateAccount.execute(coordinator.actor, { userId: coordinator.id })).resolves.toMatchObject({ ok: false, code: 'forbidden' });
    const after = (await readAccount(coordinator.id))!;
    expect(after.role).toBe('admin');
    expect(after.deactivatedAt).toBeNull();
  });

  it('changes a password only with the current one, then ends every session', async () => {
    const person = await createAccount('seller');
    const wrong = await changePassword.execute(person.actor, { currentPassword: 'not my password', password: NEW_PASSWORD, passwordAgain: NEW_PASSWORD });
    expect(wrong).toMatchObject({ ok: false, code: 'invalid_input', fieldErrors: { currentPassword: ['That is not your current password'] } });
    expect((await readAccount(person.id))!.sessionVersion).toBe(0);
    await expect(changePassword.execute(person.actor, { currentPassword: TEST_PASSWORD, password: NEW_PASSWORD, passwordAgain: NEW_PASSWORD })).resolves.toMatchObject({ ok: true });
    const after = (await readAccount(person.id))!;
    expect(after.sessionVersion).toBe(1);
    expect(await verifyPassword(NEW_PASSWORD, after.passwordHash)).toBe(true);
  });
});
