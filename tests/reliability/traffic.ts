// Traffic that keeps going whatever the answers: each lane sends its next request as soon as the
// last one is answered (after a short pause), and every answer, or its absence, is kept with its
// times, until stopped.
import type request from 'supertest';

export type Outcome = number | 'timeout' | 'no answer';

export type Sample = {
  lane: string;
  /** The lane's usual answer, when the database is there. */
  expected: number;
  /** The lane's request number, from 0. */
  n: number;
  startedAt: number;
  endedAt: number;
  outcome: Outcome;
  retryAfter?: string;
  errorCode?: string;
  errorMessage?: string;
};

type Answer = Pick<Sample, 'outcome' | 'retryAfter' | 'errorCode' | 'errorMessage'>;

export type Lane = { name: string; expected: number; send(n: number): request.Test };
export type Traffic = { samples: Sample[]; stop(): Promise<void> };

/** A request not answered within timeoutMs counts as a hang. */
export function startTraffic(lanes: Lane[], { pauseMs, timeoutMs }: { pauseMs: number; timeoutMs: number }): Traffic {
  const samples: Sample[] = [];
  let stopping = false;

  async function drive(lane: Lane): Promise<void> {
    for (let n = 0; !stopping; n++) {
      const startedAt = Date.now();
      const answer = await lane.send(n).timeout(timeoutMs).then(
        (res): Answer => ({ outcome: res.status, retryAfter: res.headers['retry-after'], errorCode: res.body?.error?.code, errorMessage: res.body?.error?.message }),
        (err: { timeout?: number; message?: string }): Answer => ({ outcome: err.timeout ? 'timeout' : 'no answer', errorMessage: err.message }),
      );
      samples.push({ lane: lane.name, expected: lane.expected, n, startedAt, endedAt: Date.now(), ...answer });
      await new Promise((r) => setTimeout(r, pauseMs));
    }
  }

  const running = Promise.all(lanes.map(drive));
  return {
    samples,
    async stop() {
      stopping = true;
      await running;
    },
  };
}
