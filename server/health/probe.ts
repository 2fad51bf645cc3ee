/** Times one dependency check, bounding it so one slow part cannot hang the health route. */
export async function probe(check: () => Promise<string>, timeoutMs = 3000) {
  const started = performance.now();
  let timer: NodeJS.Timeout | undefined;
  try {
    const detail = await Promise.race([
      check(),
      new Promise<never>((_, reject) => {
        timer = setTimeout(() => reject(new Error(`no answer within ${timeoutMs} ms`)), timeoutMs);
      }),
    ]);
    return { ok: true, latencyMs: Math.round(performance.now() - started), detail };
  } catch (error) {
    const detail = error instanceof Error ? error.message : String(error);
    return { ok: false, latencyMs: Math.round(performance.now() - started), detail };
  } finally {
    clearTimeout(timer);
  }
}
