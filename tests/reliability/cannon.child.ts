// Runs one CannonJob with autocannon and sends back its figures. Each connection gets its own
// request list through setupClient and client.setRequests (autocannon's README, Client API).
import autocannon from 'autocannon';
import type { CannonFigures, CannonJob } from './cannon';

process.once('message', async ({ url, options, requests }: CannonJob) => {
  let next = 0;
  const result = await autocannon({
    url,
    connections: options.connections,
    duration: options.durationSeconds,
    setupClient: (client) => client.setRequests(requests[next++]),
  });
  // `errors` counts connection errors and timeouts (README, Results).
  const figures: CannonFigures = { requests: result.requests.total, p50Ms: result.latency.p50, p99Ms: result.latency.p99, errors: result.errors, non2xx: result.non2xx };
  process.send!(figures, () => process.exit(0));
});
