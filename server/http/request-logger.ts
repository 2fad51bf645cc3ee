import { pinoHttp } from 'pino-http';
import { logger } from './logger';

/**
 * One log line per API request: method, path, status and time taken. Only the path is logged,
 * never bodies, cookies or tokens; a 5xx is logged at error level, everything else at info.
 */
export const requestLogger = pinoHttp({
  logger,
  customLogLevel: (_req, res, error) => (error || res.statusCode >= 500 ? 'error' : 'info'),
  serializers: {
    req: (req: { method: string; url: string }) => ({ method: req.method, url: req.url }),
    res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
  },
});
