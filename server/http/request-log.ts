// One log line per answered request, at a level set by its status: successes at debug, so the
// console shows problems, not traffic. pino-http did this, but it binds every request to a child
// logger whether a line is written or not, which cost 5–10 % of the server's CPU per signed-in
// read under load (both servers loaded in turn, tests/bench/load.bench.ts's readers); here the
// request is only read when a line is written.
import type { RequestHandler } from 'express';
import type { Logger } from 'pino';

const levelOf = (status: number): 'error' | 'warn' | 'debug' => (status >= 500 ? 'error' : status >= 400 ? 'warn' : 'debug');

export function requestLog(logger: Logger): RequestHandler {
  return (req, res, next) => {
    const started = performance.now();
    res.once('finish', () => {
      const level = levelOf(res.statusCode);
      if (logger.isLevelEnabled(level)) logger[level]({ req, res, responseTime: Math.round(performance.now() - started) }, 'request answered');
    });
    next();
  };
}
