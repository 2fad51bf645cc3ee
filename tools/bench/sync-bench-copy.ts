import { spawn } from 'node:child_process';

/** Runs psql with commands, feeding `input` on stdin; answers stdout, or fails with stderr. */
function psql(databaseUrl: string, commands: string[], input = ''): Promise<string> {
  return new Promise((resolve, reject) => {
    const args = [databaseUrl, '-X', '-q', '-v', 'ON_ERROR_STOP=1'];
    const child = spawn('psql', [...args, ...commands.flatMap((command) => ['-c', command])], {
      stdio: ['pipe', 'pipe', 'pipe'],
    });
    const out: Buffer[] = [];
    const err: Buffer[] = [];
    child.stdout.on('data', (chunk: Buffer) => out.push(chunk));
    child.stderr.on('data', (chunk: Buffer) => err.push(chunk));
    child.on('error', reject);
    child.on('close', (code) => {
      if (code === 0) resolve(Buffer.concat(out).toString('utf8'));
      else reject(new Error(`psql failed (${code}): ${Buffer.concat(err).toString('utf8')}`));
    });
    child.stdin.end(input);
  });
}

/** The study's interview rows as COPY text, exactly as PostgreSQL would take them back. */
export function exportInterviewRows(databaseUrl: string, studyId: string): Promise<string> {
  if (!/^[0-9a-f-]{36}$/.test(studyId)) throw new Error(`not a study id: ${studyId}`);
  return psql(databaseUrl, [
    `\\copy (select * from interviews where study_id = '${studyId}') to stdout`,
  ]);
}

/** The reference checks that every statement storing interviews pays for (drizzle/0007). */
const referenceChecks = `create trigger bench_interviews_copy_references
  after insert on bench_interviews_copy referencing new table as added
  for each statement execute function check_interview_references()`;

/**
 * The ceiling: the same rows loaded with one client-side `COPY … FROM STDIN` into a copy of the
 * interviews table (same columns, defaults, primary key and indexes). `LIKE` copies no
 * triggers; with `withReferenceChecks` the copy gets the statement-level reference check that
 * sync's writes pass, to show what it costs. Answers the seconds psql's `\\timing` reports for
 * the COPY (not the connection).
 */
export async function timeCopy(
  databaseUrl: string,
  rows: string,
  withReferenceChecks = false,
): Promise<number> {
  const setup = [
    'drop table if exists bench_interviews_copy',
    'create table bench_interviews_copy (like interviews including all)',
    ...(withReferenceChecks ? [referenceChecks] : []),
  ];
  await psql(databaseUrl, setup);
  try {
    const output = await psql(
      databaseUrl,
      ['\\timing on', '\\copy bench_interviews_copy from stdin'],
      rows,
    );
    const times = [...output.matchAll(/Time: ([\d.]+) ms/g)].map((match) => Number(match[1]));
    if (times.length === 0) throw new Error(`psql reported no timing: ${output}`);
    return times[times.length - 1] / 1000;
  } finally {
    await psql(databaseUrl, ['drop table if exists bench_interviews_copy']);
  }
}
