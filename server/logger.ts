import { pino, type Logger } from 'pino';
import pretty from 'pino-pretty';
import { env } from './config/env';

/**
 * The process's one logger: request lines (through pino-http in app.ts) and the work that runs outside a
 * request (the overdue sweep, stored-file removal, alert e-mails). JSON lines in production and tests; one
 * readable line per event in development, where a person watches the console.
 */
export const logger: Logger =
  env.NODE_ENV === 'development'
    ? pino(
        { level: env.LOG_LEVEL },
        pretty({ sync: true, translateTime: 'HH:MM:ss', ignore: 'pid,hostname,req,res,responseTime' }),
      )
    : pino({ level: env.LOG_LEVEL });
