import type { IncomingMessage, ServerResponse } from 'node:http';
import { pino, type DestinationStream, type Logger } from 'pino';
import type { Config } from './config';

/** What log lines say about a request and its response: no headers, so no cookies or CSRF tokens. */
const httpLogSerializers = {
  req: (req: IncomingMessage & { originalUrl?: string }) => ({ method: req.method, url: req.originalUrl ?? req.url, remoteAddress: req.socket?.remoteAddress }),
  res: (res: ServerResponse) => ({ statusCode: res.statusCode }),
  err: pino.stdSerializers.err,
};

/** Logs to standard output, or to `destination` (tests read what was logged). */
export function createLogger(config: Config, destination?: DestinationStream): Logger {
  return pino({ level: config.env === 'test' ? 'warn' : 'info', serializers: httpLogSerializers }, destination);
}
