// 100 signed-in readers on loopback read run summaries and step maps while a sign-in attack runs
// (tests/reliability/load.ts): no errors, only 2xx for the readers, and both sign-in limits answer
// 429 past their limit. Latency is printed, not asserted: speed targets belong to the benchmark
// (`npm run bench -- load`; `npm run reliability` prints a 30 s run outside jest).
import { runLoad } from '../reliability/load';

const DURATION_SECONDS = 10;
const CONNECTIONS = 100;

test(`when ${CONNECTIONS} signed-in readers load the server for ${DURATION_SECONDS} s beside a sign-in attack, then no errors and the sign-in limits hold`, async () => {
  const result = await runLoad({ durationSeconds: DURATION_SECONDS, connections: CONNECTIONS });
  const figures = `p50 ${result.p50Ms} ms, p99 ${result.p99Ms} ms, ${result.requests} requests, ${result.errors} errors, ${result.non2xx} non-2xx`;
  process.stdout.write(`load, ${CONNECTIONS} connections × ${DURATION_SECONDS} s: ${figures}\nsign-in limits: ${result.signInLimit.detail}\n`);

  expect(result.requests).toBeGreaterThan(0);
  expect({ errors: result.errors, non2xx: result.non2xx }).toEqual({ errors: 0, non2xx: 0 });
  expect(result.signInLimit).toMatchObject({ perAddress: true, perAccount: true });
});
