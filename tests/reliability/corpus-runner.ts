// Sends one corpus case and judges the answer. A refusal must be a 4xx in the API's one error
// shape with a message that says what is wrong; legal but awkward input (HTML, SQL-looking or
// right-to-left text) must be stored and returned exactly as sent; an unknown query parameter
// must change nothing. The snapshot around the whole corpus proves nothing was partly saved.
import type request from 'supertest';
import type { Client } from '../support/client';
import type { TestApp } from '../support/test-app';
import { apiErrorSchema } from '../../shared/schemas';
import { makeCorpusFixtures, snapshotChanges, takeSnapshot, type CorpusFixtures } from './corpus-fixtures';

type Send = (c: Client, f: CorpusFixtures) => Promise<request.Response>;

/** A 4xx (this one, if given) with this error code, a message matching `message` and within `withinMs`, if given. */
export type Refusal = { status?: number; code?: string; message?: RegExp; withinMs?: number };

export type Outcome =
  | { refused: Refusal }
  /** Legal input: answered `status`; `readBack` then finds `text` unchanged, and `undo` removes what was made. */
  | { kept: { text: string; readBack(c: Client, res: request.Response): Promise<string>; undo(c: Client, res: request.Response): Promise<void> } }
  /** The same answer as `plain`, the request without the oddity. */
  | { ignored: { plain: Send } };

export type BadInputCase = { name: string; send: Send; expect: Outcome };

// Messages that say nothing about the input (ours for 500s, and default library wordings).
const GENERIC = [/something went wrong/i, /^bad request\.?$/i, /^invalid input\.?$/i, /could not be read\.?$/i, /expected \w+, received \w+/i, /^internal/i];

function refusalProblem(res: request.Response, want: Refusal, ms: number): string | null {
  if (res.status < 400 || res.status >= 500) return `answered ${res.status}, not a 4xx: ${JSON.stringify(res.body).slice(0, 300)}`;
  if (want.status !== undefined && res.status !== want.status) return `answered ${res.status}, expected ${want.status}: ${JSON.stringify(res.body).slice(0, 300)}`;
  const shape = apiErrorSchema.safeParse(res.body);
  if (!shape.success || !/json/.test(res.headers['content-type'] ?? '')) return `the answer is not the {error:{code,message}} shape: ${String(res.text).slice(0, 200)}`;
  const { code, message } = shape.data.error;
  if (want.code !== undefined && code !== want.code) return `error code ${code}, expected ${want.code} (${message})`;
  if (message.trim().length < 12 || GENERIC.some((g) => g.test(message))) return `the message does not say what is wrong: "${message}"`;
  if (want.message && !want.message.test(message)) return `the message "${message}" does not match ${want.message}`;
  if (want.withinMs !== undefined && ms > want.withinMs) return `refused after ${ms} ms, more than ${want.withinMs} ms`;
  return null;
}

async function judge(c: Client, f: CorpusFixtures, kase: BadInputCase): Promise<string | null> {
  const started = Date.now();
  const res = await kase.send(c, f);
  const ms = Date.now() - started;
  const outcome = kase.expect;
  if ('refused' in outcome) return refusalProblem(res, outcome.refused, ms);
  if (res.status >= 300) return `legal input answered ${res.status}: ${JSON.stringify(res.body).slice(0, 300)}`;
  if ('ignored' in outcome) {
    const plain = await outcome.ignored.plain(c, f);
    return plain.status === res.status && JSON.stringify(plain.body) === JSON.stringify(res.body) ? null : 'the answer differs from the one without the unknown parameter';
  }
  const stored = await outcome.kept.readBack(c, res);
  await outcome.kept.undo(c, res);
  return stored === outcome.kept.text ? null : `stored ${JSON.stringify(stored)} instead of ${JSON.stringify(outcome.kept.text)}`;
}

export type Corpus = {
  /** Why the case failed, or null when it was handled cleanly. */
  check(kase: BadInputCase): Promise<string | null>;
  /** Tables and fixture objects that differ from before the first case. */
  changes(): Promise<string[]>;
};

/** Builds the fixtures and takes the "before" snapshot. */
export async function openCorpus(t: TestApp): Promise<Corpus> {
  const { owner, fixtures } = await makeCorpusFixtures(t);
  const before = await takeSnapshot(t, owner, fixtures);
  return {
    check: async (kase) => {
      try {
        return await judge(owner, fixtures, kase);
      } catch (err) {
        return `the request failed: ${err instanceof Error ? err.message : String(err)}`;
      }
    },
    changes: async () => snapshotChanges(before, await takeSnapshot(t, owner, fixtures)),
  };
}
