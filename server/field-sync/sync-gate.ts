import type { RequestHandler } from 'express';
import type { Config } from '../config';
import { answerTooMany } from '../http/too-many';

/**
 * Lets at most `SYNC_CONCURRENCY` sync batches through one web process at a time; the rest wait
 * in a short line, and past its length or wait the device is told to come back later (503 with
 * `Retry-After`) rather than piling up. Batches are heavy (validation, a large insert), reads
 * are light: without the gate fifty phones returning at once left reads waiting seconds.
 * Mounted before the body parser, so a waiting batch costs no parsing either.
 */
export function syncGate(config: Config): RequestHandler {
  let running = 0;
  const waiting: Array<() => void> = [];
  const release = () => {
    const nextInLine = waiting.shift();
    if (nextInLine) nextInLine();
    else running -= 1;
  };
  return (req, res, next) => {
    if (req.method !== 'POST') return next();
    const enter = () => {
      let released = false;
      const once = () => {
        if (released) return;
        released = true;
        release();
      };
      res.once('finish', once);
      res.once('close', once);
      next();
    };
    if (running < config.SYNC_CONCURRENCY) {
      running += 1;
      enter();
      return;
    }
    if (waiting.length >= config.SYNC_QUEUE_LENGTH) {
      answerTooMany(res, 503, 'sync-busy', 2000, 'The server is busy with other devices’ syncs.');
      return;
    }
    const turn = () => {
      clearTimeout(timer);
      enter();
    };
    const timer = setTimeout(() => {
      const at = waiting.indexOf(turn);
      if (at >= 0) waiting.splice(at, 1);
      answerTooMany(res, 503, 'sync-busy', 2000, 'The server is busy with other devices’ syncs.');
    }, config.SYNC_QUEUE_WAIT_MS);
    waiting.push(turn);
    // A device that gave up leaves the line.
    res.once('close', () => {
      const at = waiting.indexOf(turn);
      if (at >= 0) {
        waiting.splice(at, 1);
        clearTimeout(timer);
      }
    });
  };
}
