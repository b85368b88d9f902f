// Development and test SMTP catcher: accepts every message on loopback and keeps it as a JSON
// file in the outbox directory, where the Outbox page (GET /api/v1/dev/outbox) reads it.
import { randomUUID } from 'node:crypto';
import { mkdir, readdir, readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { SMTPServer } from 'smtp-server';
import { simpleParser, type AddressObject } from 'mailparser';
import type { CaughtMail } from '../../shared/schemas';

export type MailCatcher = { port: number; close(): Promise<void> };

const linkPattern = /https?:\/\/[^\s<>"')]+/g;

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(field) ? field : field ? [field] : [];
  return list.flatMap((a) => a.value.map((v) => v.address ?? '')).filter(Boolean);
}

export async function startMailCatcher(outboxDir: string, port = 0): Promise<MailCatcher> {
  await mkdir(outboxDir, { recursive: true });
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          const text = parsed.text ?? '';
          const mail: CaughtMail = {
            id: randomUUID(),
            receivedAt: new Date().toISOString(),
            from: addresses(parsed.from)[0] ?? '',
            to: addresses(parsed.to),
            subject: parsed.subject ?? '',
            text,
            links: text.match(linkPattern) ?? [],
          };
          await writeFile(path.join(outboxDir, `${mail.receivedAt.replace(/[:.]/g, '-')}-${mail.id}.json`), JSON.stringify(mail));
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve());
  });
  const address = server.server.address();
  const boundPort = typeof address === 'object' && address ? address.port : port;
  return { port: boundPort, close: () => new Promise((resolve) => server.close(() => resolve())) };
}

/** Caught messages, newest first. */
export async function readOutbox(outboxDir: string): Promise<CaughtMail[]> {
  let names: string[];
  try {
    names = await readdir(outboxDir);
  } catch {
    return [];
  }
  const files = names.filter((n) => n.endsWith('.json')).sort().reverse();
  return Promise.all(files.map(async (n) => JSON.parse(await readFile(path.join(outboxDir, n), 'utf8')) as CaughtMail));
}
