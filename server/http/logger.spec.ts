import { Writable } from 'node:stream';
import { createLogger, logLevelFrom } from './logger';

function capture() {
  const lines: string[] = [];
  const stream = new Writable({
    write(chunk: Buffer, _encoding, done) {
      lines.push(...chunk.toString('utf8').split('\n').filter(Boolean));
      done();
    },
  });
  return { lines, stream };
}

describe('the server logger', () => {
  it('keeps a user value with newlines, controls and bidi marks on one JSON line', () => {
    const { lines, stream } = capture();
    const forged = 'kiosk\n{"level":30,"msg":"admin signed in"}\r\u0007\u2028\u202e';
    createLogger({ LOG_LEVEL: 'info' }, stream).info({ name: forged }, 'route saved');
    expect(lines).toHaveLength(1);
    const line = lines[0] ?? '';
    const raw = [...line].filter((c) => c.charCodeAt(0) < 0x20 || '\u2028\u202e'.includes(c));
    expect(raw).toEqual([]);
    expect((JSON.parse(line) as { name: string }).name).toBe(forged);
  });

  it('takes its level from LOG_LEVEL, and is quiet under tests otherwise', () => {
    expect(logLevelFrom({ LOG_LEVEL: 'debug' })).toBe('debug');
    expect(logLevelFrom({ NODE_ENV: 'test' })).toBe('warn');
    expect(logLevelFrom({ LOG_LEVEL: 'loud' })).toBe('info');
  });
});
