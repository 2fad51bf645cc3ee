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

/** The foreign keys of `interviews` that sync pays for on every row (see drizzle/). */
const interviewForeignKeys = [
  'add foreign key (study_id) references studies (id)',
  'add foreign key (questionnaire_version_id) references questionnaire_versions (id)',
  'add foreign key (route_id) references routes (id)',
  'add foreign key (point_id) references sampling_points (id)',
  'add foreign key (enumerator_id) references users (id)',
].join(', ');

/**
 * The ceiling: the same rows loaded with one client-side `COPY … FROM STDIN` into a copy of the
 * interviews table (same columns, defaults, primary key and indexes). `LIKE` copies no foreign
 * keys; with `withForeignKeys` the copy gets the ones sync's inserts are checked against, to show
 * what they cost. Answers the seconds psql's `\\timing` reports for the COPY (not the connection).
 */
export async function timeCopy(
  databaseUrl: string,
  rows: string,
  withForeignKeys = false,
): Promise<number> {
  const setup = [
    'drop table if exists bench_interviews_copy',
    'create table bench_interviews_copy (like interviews including all)',
    ...(withForeignKeys ? [`alter table bench_interviews_copy ${interviewForeignKeys}`] : []),
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
