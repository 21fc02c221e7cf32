import request from 'supertest';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { Passwords } from '../credentials/passwords';
import { backgroundSettled } from '../http/background-work';
import { AuthService } from '../domain/auth/auth.service';
import { count, makeUser, signIn, type TestUser } from '../../test/fixtures';
import { startTestApp, type TestApp } from '../../test/test-app';

/** An argon2 PHC string's parameters ("$argon2id$v=19$m=…,t=…,p=…"), without salt and hash. */
const argon2Parameters = (hash: string) => hash.split('$').slice(1, 4).join('$');

/**
 * No account enumeration (issue 13.7): sign-in, password reset and
 * invitation answers are the same for a known and an unknown address, and so
 * is the work done before answering (asserted as the same code path, never by
 * timing).
 */
describe('no account enumeration through sign-in, reset or invitations', () => {
  let t: TestApp;
  let known: TestUser;
  let inactive: TestUser;

  beforeAll(async () => {
    t = await startTestApp({
      HOOPLINE_SIGN_IN_LIMIT_PER_ADDRESS: '1000',
      HOOPLINE_SIGN_IN_LIMIT_PER_ACCOUNT: '1000',
    });
    known = await makeUser(t, { email: 'known.person@lab.example' });
    inactive = await makeUser(t, { email: 'gone.person@lab.example' });
    await t.dataSource.query('update users set active = false where id = $1', [inactive.id]);
  });
  afterAll(async () => {
    await t.close();
  });
  afterEach(() => {
    vi.restoreAllMocks();
  });

  const answer = (res: request.Response) => ({
    status: res.status,
    body: res.body,
    cookies: res.headers['set-cookie'] ?? null,
  });

  it('sign-in: a wrong password, an unknown address and a deactivated account get the same answer, each after one argon2 verification of the same cost', async () => {
    const verify = vi.spyOn(Passwords.prototype, 'verify');
    const attempts = [
      { email: known.email, password: 'not the password at all' },
      { email: 'nobody.here@lab.example', password: 'not the password at all' },
      // The right password of a deactivated account says no more than a wrong one.
      { email: inactive.email, password: inactive.password },
    ];
    const answers: ReturnType<typeof answer>[] = [];
    const hashes: string[] = [];
    for (const attempt of attempts) {
      verify.mockClear();
      answers.push(answer(await request(t.server).post('/api/auth/sign-in').send(attempt)));
      expect(verify).toHaveBeenCalledTimes(1);
      hashes.push(argon2Parameters(String(verify.mock.calls[0]![0])));
    }
    expect(answers[0]).toEqual({
      status: 401,
      body: {
        error: {
          code: 'invalid_credentials',
          message: 'the e-mail address or the password is wrong',
        },
      },
      cookies: null,
    });
    expect(answers[1]).toEqual(answers[0]);
    expect(answers[2]).toEqual(answers[0]);
    // The unknown address is checked against a dummy hash made with the same argon2 cost.
    expect(new Set(hashes).size).toBe(1);
    expect(hashes[0]).toMatch(/^argon2id\$v=19\$m=\d+,t=\d+,p=\d+$/);
  });

  it('password reset request: the same 202 for a known, an unknown and a deactivated address, and the same work before answering', async () => {
    const issue = vi.spyOn(AuthService.prototype, 'issueRequestedReset');
    const resetsBefore = await count(t, 'password_resets');
    const mailsBefore = await count(t, 'mail_outbox');
    const answers: ReturnType<typeof answer>[] = [];
    const addresses = [
      known.email,
      'nobody.here@lab.example',
      inactive.email,
      ' KNOWN.person@lab.example ',
    ];
    for (const [i, email] of addresses.entries()) {
      // The work is held back: the answer must come without waiting for it.
      let release = () => {};
      issue.mockImplementationOnce(() => new Promise<void>((resolve) => (release = resolve)));
      const res = await request(t.server).post('/api/auth/password-reset/request').send({ email });
      answers.push(answer(res));
      await new Promise((resolve) => setImmediate(resolve));
      expect(issue).toHaveBeenCalledTimes(i + 1); // the same function for every address
      release();
      await backgroundSettled();
    }
    expect(issue).toHaveBeenCalledTimes(4);
    expect(answers.every((a) => JSON.stringify(a) === JSON.stringify(answers[0]))).toBe(true);
    expect(answers[0]).toEqual({ status: 202, body: { status: 'accepted' }, cookies: null });
    // The spied work did nothing: no rows. Unspied, only the known, active address gets a reset.
    expect(await count(t, 'password_resets')).toBe(resetsBefore);
    vi.restoreAllMocks();
    for (const email of [known.email, 'nobody.here@lab.example', inactive.email]) {
      await request(t.server).post('/api/auth/password-reset/request').send({ email }).expect(202);
    }
    await backgroundSettled();
    expect(await count(t, 'password_resets')).toBe(resetsBefore + 1);
    expect(await count(t, 'mail_outbox')).toBe(mailsBefore + 1);
  });

  it('invitations: an unknown, a revoked and an accepted token get the same answers', async () => {
    const admin = await makeUser(t, { isAdmin: true });
    const a = await signIn(t, admin);
    const revoked = await a
      .post('/api/invitations', { email: 'revoked.one@lab.example', name: 'Revoked' })
      .expect(201);
    await a.delete(`/api/invitations/${revoked.body.invitation.id}`).expect(204);
    const accepted = await a
      .post('/api/invitations', { email: 'accepted.one@lab.example', name: 'Accepted' })
      .expect(201);
    await request(t.server)
      .post('/api/auth/accept-invitation')
      .send({ token: accepted.body.token, name: 'Accepted', password: 'a long enough password' })
      .expect(200);
    const tokens = ['A'.repeat(43), revoked.body.token as string, accepted.body.token as string];
    const opened: ReturnType<typeof answer>[] = [];
    const accepts: ReturnType<typeof answer>[] = [];
    for (const token of tokens) {
      opened.push(answer(await request(t.server).get(`/api/auth/invitations/${token}`)));
      accepts.push(
        answer(
          await request(t.server)
            .post('/api/auth/accept-invitation')
            .send({ token, name: 'Someone', password: 'a long enough password' }),
        ),
      );
    }
    expect(opened[0]).toMatchObject({ status: 404 });
    expect(opened[1]).toEqual(opened[0]);
    expect(opened[2]).toEqual(opened[0]);
    expect(accepts[0]).toMatchObject({ status: 400, body: { error: { code: 'invalid_token' } } });
    expect(accepts[1]).toEqual(accepts[0]);
    expect(accepts[2]).toEqual(accepts[0]);
  });
});
