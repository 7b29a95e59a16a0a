import pino from 'pino';
import type { Config } from './config.ts';

export function createLogger(config: Pick<Config, 'LOG_LEVEL'>) {
  return pino({ level: config.LOG_LEVEL, base: { app: 'vatside' } });
}
export type Logger = ReturnType<typeof createLogger>;
