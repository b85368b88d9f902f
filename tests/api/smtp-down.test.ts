// Fault: the SMTP server down while sign-up, forgot-password and an invitation send mail. The
// actions answer 2xx and save their data; the mail is retried and, once the server is back, each
// arrives exactly once with working links (tests/reliability/smtp-down.ts). A mail whose retries
// run out is kept as failed, not dropped.
import { QueryTypes } from 'sequelize';
import { closedPort, runSmtpDown } from '../reliability/smtp-down';
import { makeUser } from '../support/people';
import { recordReliability } from '../support/reliability-log';
import { client } from '../support/client';
import { startTestApp } from '../support/test-app';

test('when the SMTP server is down, then the actions still succeed and every mail arrives once when it is back', async () => {
  const row = await runSmtpDown();
  recordReliability({ kind: 'fault', ...row });
  // The detail names whatever went wrong.
  expect(row).toMatchObject({ survived: true, nothingLost: true });
  // Each of the 3 mails refused at least twice: a first try and a retry after backoff.
  expect(row.injected).toBeGreaterThanOrEqual(6);
});

test('when the SMTP server stays down past the retry limit, then the mail is kept as failed with its error', async () => {
  const t = await startTestApp({ smtpUrl: `smtp://127.0.0.1:${await closedPort()}`, mailRetryLimit: 1 });
  try {
    const person = await makeUser('Unlucky');
    expect((await client(t.app).post('/api/v1/auth/forgot', { email: person.email })).status).toBe(202);
    type Job = { state: string; retry_count: number; to: string; error: string };
    const sql = `SELECT state, retry_count, data->>'to' AS "to", output->>'message' AS error FROM pgboss.job WHERE name = 'mail'`;
    let jobs: Job[] = [];
    for (let i = 0; i < 100 && jobs[0]?.state !== 'failed'; i++) {
      await new Promise((r) => setTimeout(r, 100));
      jobs = await t.sequelize.query<Job>(sql, { type: QueryTypes.SELECT });
    }
    expect(jobs).toEqual([{ state: 'failed', retry_count: 1, to: person.email, error: expect.stringContaining('ECONNREFUSED') }]);
  } finally {
    await t.close();
  }
});
