import { pino, type DestinationStream, type Logger } from 'pino';
import { escapeLogLine } from './log-line-escape';

const levels = ['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent'] as const;
type LogLevel = (typeof levels)[number];

/** `LOG_LEVEL` when it names a level; else `info`, or `warn` under jest so tests stay quiet. */
export function logLevelFrom(env: NodeJS.ProcessEnv): LogLevel {
  const wanted = env['LOG_LEVEL'] as LogLevel | undefined;
  if (wanted && levels.includes(wanted)) return wanted;
  return env['NODE_ENV'] === 'test' ? 'warn' : 'info';
}

/**
 * A structured (JSON lines) logger: user values are JSON-escaped, so a newline or a control
 * character in a path or a name cannot forge a log line. Writes to stdout unless given a stream.
 */
export function createLogger(
  env: NodeJS.ProcessEnv = process.env,
  destination?: DestinationStream,
): Logger {
  const options = {
    level: logLevelFrom(env),
    base: { pid: process.pid },
    hooks: { streamWrite: escapeLogLine },
  };
  return destination ? pino(options, destination) : pino(options);
}

/** The server's one logger. */
export const logger = createLogger();
