import autocannon from 'autocannon';

export interface LoadResult {
  path: string;
  requests: number;
  p50Ms: number;
  p95Ms: number;
  errors: number;
}

/** A bounded load run against a loopback URL: fixed connections, fixed duration, then it stops. */
export async function load(
  baseUrl: string,
  path: string,
  connections: number,
  seconds: number,
  headers: Record<string, string> = {},
): Promise<LoadResult> {
  const result = await autocannon({
    url: `${baseUrl}${path}`,
    connections,
    duration: seconds,
    headers,
  });
  const latency = result.latency as unknown as Record<string, number>;
  return {
    path,
    requests: result.requests.total,
    p50Ms: latency.p50,
    // autocannon reports p90 and p97_5; p95 sits between them, so take the larger as a safe bound.
    p95Ms: latency.p97_5 ?? latency.p99,
    errors: result.errors + result.non2xx,
  };
}
