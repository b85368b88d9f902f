// The app under load: a real server on a random port of 127.0.0.1 over its own database, with
// the demo seed (its finished runs are what the readers read) and `readers` extra viewers of the
// demo team, each signed in with a session of their own.
import type { AddressInfo } from 'node:net';
import type { Server, ServerResponse } from 'node:http';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { createLogger } from '../../server/logger';
import { createMailer } from '../../server/mail/mailer';
import { Membership, Run, Team, User } from '../../server/models';
import { DEMO_TEAM, seedDemo } from '../../server/seed/demo';
import { hashPassword } from '../../server/services/accounts';
import { createLoadDatabase } from './load-database';
import { signIn } from './sessions';

export const LOAD_PASSWORD = 'load-reader-password';
/** Sign-ins in flight while the readers are set up: the server compares passwords one at a time (server/auth/passwords.ts). */
const SIGN_IN_CONCURRENCY = 4;
/** Longest wait at close for handlers still running. */
const DRAIN_TIMEOUT_MS = 10_000;

export type FinishedRun = { id: number; steps: number };

export type LoadServer = {
  url: string;
  runs: FinishedRun[];
  /** One signed-in session cookie per reader. */
  readerCookies: string[];
  /** Accounts that exist and belong to nobody reading: targets and bystanders of the sign-in attack. */
  spareEmails: string[];
  close(): Promise<void>;
};

async function createAccounts(emails: string[]): Promise<User[]> {
  const passwordHash = await hashPassword(LOAD_PASSWORD);
  return User.bulkCreate(emails.map((email, i) => ({ email, name: `Load person ${i + 1}`, passwordHash, emailVerifiedAt: new Date(), isAdmin: false })));
}

async function signInAll(url: string, emails: string[]): Promise<string[]> {
  const cookies: string[] = [];
  for (let i = 0; i < emails.length; i += SIGN_IN_CONCURRENCY) {
    cookies.push(...(await Promise.all(emails.slice(i, i + SIGN_IN_CONCURRENCY).map((email) => signIn(url, email, LOAD_PASSWORD)))));
  }
  return cookies;
}

export async function startLoadServer(readers: number, spares = 2): Promise<LoadServer> {
  const database = await createLoadDatabase();
  const config = { ...loadConfig({ NODE_ENV: 'test' }), databaseUrl: database.url };
  const logger = createLogger(config);
  // Nothing here sends mail, so the mailer never starts its queue.
  const app = createApp({ config, sequelize: database.sequelize, mailer: createMailer(config, database.sequelize, logger), logger });
  let server: Server | null = null;
  // Handlers of requests still in flight when autocannon cut its connections keep running; the
  // pools must outlive them. A response whose socket is gone never emits 'finish', so they are
  // told apart by writableEnded.
  const open = new Set<ServerResponse>();
  const close = async (): Promise<void> => {
    if (server) {
      server.closeAllConnections();
      await new Promise<void>((resolve) => server!.close(() => resolve()));
      const until = Date.now() + DRAIN_TIMEOUT_MS;
      while ([...open].some((res) => !res.writableEnded) && Date.now() < until) await new Promise((r) => setTimeout(r, 20));
    }
    await app.close();
    await database.drop();
  };
  try {
    await seedDemo(database.sequelize);
    const team = (await Team.findOne({ where: { name: DEMO_TEAM } }))!;
    const runs = await Run.findAll({ where: { teamId: team.id, status: 'succeeded' }, attributes: ['id', 'steps'], order: [['id', 'ASC']] });
    const readerEmails = Array.from({ length: readers }, (_, i) => `reader.${i + 1}@load.example`);
    const spareEmails = Array.from({ length: spares }, (_, i) => `spare.${i + 1}@load.example`);
    const accounts = await createAccounts([...readerEmails, ...spareEmails]);
    await Membership.bulkCreate(accounts.slice(0, readers).map((user) => ({ teamId: team.id, userId: user.id, role: 'viewer' as const })));
    server = await new Promise<Server>((resolve) => {
      const s = app.app.listen(0, '127.0.0.1', () => resolve(s));
    });
    server.on('request', (_req, res: ServerResponse) => {
      open.add(res);
      res.once('finish', () => open.delete(res));
    });
    const url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    return { url, runs: runs.map((r) => ({ id: r.id, steps: r.steps })), readerCookies: await signInAll(url, readerEmails), spareEmails, close };
  } catch (err) {
    await close();
    throw err;
  }
}
