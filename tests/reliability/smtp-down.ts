// Fault: the SMTP server is down while someone signs up, someone asks for a password reset and an
// owner invites someone. Each action answers as usual and its data is saved; its mail waits in the
// queue and is refused at least twice (so the backoff is exercised); then a catcher starts on the
// SMTP port and every mail must arrive exactly once, with links that work.
import { createServer } from 'node:net';
import { QueryTypes } from 'sequelize';
import { readOutbox, startMailCatcher, type MailCatcher } from '../../server/mail/catcher';
import { AccountToken, Invitation, User } from '../../server/models';
import type { CaughtMail } from '../../shared/schemas';
import { client } from '../support/client';
import { makeTeam, makeUser, PASSWORD } from '../support/people';
import { startTestApp, type TestApp } from '../support/test-app';

export type SmtpDownResult = { name: string; injected: number; survived: boolean; nothingLost: boolean; detail: string };

/** Refused deliveries per mail before SMTP comes back: the first try and one retry after a backoff. */
const REFUSALS_EACH = 2;
const WAIT_MS = 30_000;

/** A loopback port with nothing listening on it (taken from the OS, then released). */
export async function closedPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const address = server.address();
  await new Promise((resolve) => server.close(resolve));
  if (typeof address !== 'object' || !address) throw new Error('no port');
  return address.port;
}

async function waitFor<T>(probe: () => Promise<T | null>): Promise<T | null> {
  const until = Date.now() + WAIT_MS;
  while (Date.now() < until) {
    const found = await probe();
    if (found !== null) return found;
    await new Promise((r) => setTimeout(r, 50));
  }
  return null;
}

type QueuedMail = { state: string; retry_count: number };
const queuedMail = (t: TestApp): Promise<QueuedMail[]> => t.sequelize.query<QueuedMail>(`SELECT state, retry_count FROM pgboss.job WHERE name = 'mail'`, { type: QueryTypes.SELECT });
const archivedMail = async (t: TestApp): Promise<number> => (await t.sequelize.query(`SELECT 1 FROM pgboss.archive WHERE name = 'mail'`, { type: QueryTypes.SELECT })).length;

const tokenFrom = (mail: CaughtMail | undefined, route: string): string => {
  const link = mail?.links.find((l) => l.includes(`/${route}?token=`));
  return link ? (new URL(link).searchParams.get('token') ?? '') : '';
};

export async function runSmtpDown(): Promise<SmtpDownResult> {
  const port = await closedPort();
  const t = await startTestApp({ smtpUrl: `smtp://127.0.0.1:${port}` });
  let catcher: MailCatcher | null = null;
  const unanswered: string[] = [];
  const lost: string[] = [];
  try {
    const owner = await makeUser('Outage Owner');
    const forgetful = await makeUser('Forgetful');
    const team = await makeTeam('Outage Crew', [[owner, 'owner']]);
    const newcomer = { email: 'newcomer@example.org', name: 'Newcomer', password: 'outage-pass-1' };
    const invitee = 'invitee@example.org';
    const ownerClient = client(t.app);
    await ownerClient.signIn(owner.email, PASSWORD);

    // While nothing listens on the SMTP port.
    const outageStart = Date.now();
    const answers = {
      'sign-up': await client(t.app).post('/api/v1/auth/sign-up', newcomer),
      'forgot-password': await client(t.app).post('/api/v1/auth/forgot', { email: forgetful.email }),
      invitation: await ownerClient.post(`/api/v1/teams/${team.id}/invitations`, { email: invitee, role: 'viewer' }),
    };
    for (const [action, res] of Object.entries(answers)) if (res.status < 200 || res.status > 299) unanswered.push(`${action} answered ${res.status}`);

    const user = await User.findOne({ where: { email: newcomer.email } });
    if (!user || user.emailVerifiedAt) lost.push('the new account was not saved unconfirmed');
    if (!user || (await AccountToken.count({ where: { userId: user.id, purpose: 'verify' } })) !== 1) lost.push('no confirmation token saved');
    if ((await AccountToken.count({ where: { userId: forgetful.id, purpose: 'reset' } })) !== 1) lost.push('no reset token saved');
    if ((await Invitation.count({ where: { teamId: team.id, email: invitee } })) !== 1) lost.push('no invitation saved');

    const refused = await waitFor(async () => {
      const jobs = await queuedMail(t);
      return jobs.length === 3 && jobs.every((j) => j.state === 'retry' && j.retry_count + 1 >= REFUSALS_EACH) ? jobs : null;
    });
    const injected = (refused ?? []).reduce((sum, j) => sum + j.retry_count + 1, 0);
    if (!refused) lost.push(`the 3 mails were not each refused ${REFUSALS_EACH} times and waiting for a retry: ${JSON.stringify(await queuedMail(t))}`);
    const outageMs = Date.now() - outageStart;

    // The SMTP server is back, on the same port.
    catcher = await startMailCatcher(t.config.outboxDir, port);
    const back = Date.now();
    const expected = [
      [newcomer.email, 'Confirm your e-mail'],
      [forgetful.email, 'Reset your Patchcast password'],
      [invitee, 'invited you to Outage Crew'],
    ] as const;
    const find = (outbox: CaughtMail[], [to, subject]: (typeof expected)[number]): CaughtMail[] => outbox.filter((m) => m.to.includes(to) && m.subject.includes(subject));
    const arrived = await waitFor(async () => {
      const outbox = await readOutbox(t.config.outboxDir);
      return expected.every((e) => find(outbox, e).length > 0) ? outbox : null;
    });
    const deliveredMs = Date.now() - back;
    // Once the queue holds no mail, no delivery is left that could bring a duplicate.
    const drained = await waitFor(async () => ((await queuedMail(t)).length === 0 ? true : null));
    const outbox = await readOutbox(t.config.outboxDir);
    if (!arrived) lost.push(`not every mail arrived within ${WAIT_MS / 1000} s of SMTP coming back`);
    if (!drained) lost.push('mail still queued after delivery');
    for (const e of expected) if (find(outbox, e).length > 1) lost.push(`"${e[1]}" to ${e[0]} arrived ${find(outbox, e).length} times`);
    if (outbox.length !== expected.length) lost.push(`${outbox.length} mails caught, ${expected.length} expected`);
    if ((await archivedMail(t)) > 0) lost.push('sent mail (with its link tokens) kept in pgboss.archive');

    // The links in the retried mail work.
    const [confirm, reset, invitation] = expected.map((e) => find(outbox, e)[0]);
    const anyone = client(t.app);
    if ((await anyone.post('/api/v1/auth/verify', { token: tokenFrom(confirm, 'verify') })).status !== 200) lost.push('the confirmation link did not confirm');
    if ((await anyone.signIn(newcomer.email, newcomer.password)).status !== 200) lost.push('the new account cannot sign in after confirming');
    if ((await anyone.post('/api/v1/auth/reset', { token: tokenFrom(reset, 'reset'), password: 'after-the-outage-2' })).status !== 200) lost.push('the reset link did not reset');
    if ((await client(t.app).signIn(forgetful.email, 'after-the-outage-2')).status !== 200) lost.push('the new password does not sign in');
    const preview = await anyone.get(`/api/v1/invitations/${tokenFrom(invitation, 'invitation')}`);
    if (preview.status !== 200 || preview.body.email !== invitee) lost.push('the invitation link does not open the invitation');

    const problems = [...unanswered, ...lost];
    return {
      name: 'SMTP server down (sign-up, password reset, invitation)',
      injected,
      survived: unanswered.length === 0,
      nothingLost: lost.length === 0,
      detail: problems.length
        ? problems.join('; ')
        : `3 actions answered 2xx with SMTP down; ${injected} deliveries refused over ${(outageMs / 1000).toFixed(1)} s; all 3 mails arrived once, ${(deliveredMs / 1000).toFixed(1)} s after SMTP came back; their links worked`,
    };
  } finally {
    await catcher?.close();
    await t.close();
  }
}
