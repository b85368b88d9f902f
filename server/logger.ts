import { pino, type Logger } from 'pino';
import type { Config } from './config';

export function createLogger(config: Config): Logger {
  return pino({ level: config.env === 'test' ? 'warn' : 'info', redact: ['req.headers.cookie', 'req.headers["x-csrf-token"]'] });
}
