/**
 * Polls `probe` until `done` accepts its value, for effects that arrive asynchronously in tests
 * (background jobs, provider events, mail). Throws with `what` when the time runs out.
 */
export async function eventually<T>(
  probe: () => Promise<T>,
  done: (value: T) => boolean,
  options: { what: string; timeoutMs?: number; intervalMs?: number },
): Promise<T> {
  const timeoutMs = options.timeoutMs ?? 20_000;
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await probe();
    if (done(value)) return value;
    if (Date.now() > deadline) throw new Error(`${options.what} did not happen within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, options.intervalMs ?? 50));
  }
}
