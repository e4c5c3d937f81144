/** How long a piece of work took, in milliseconds, with its result. */
export async function timed<T>(work: () => Promise<T>): Promise<{ ms: number; value: T }> {
  const start = process.hrtime.bigint();
  const value = await work();
  return { ms: Number(process.hrtime.bigint() - start) / 1e6, value };
}
