import autocannon from 'autocannon';
import { editorBenchPart } from '../bench-part';
import type { BenchTable } from '../bench-table';
import { signInDesigner } from './bench-session';

export const THROUGHPUT_TARGET_RATIO = 0.5;
const CONNECTIONS = 10;
const SECONDS = 10;
const ROUNDS = 2;

type Load = { path: string; method?: string; headers?: Record<string, string>; body?: string };

/** One autocannon run on loopback; answers per second counted from 2xx responses only. */
async function hammer(baseUrl: string, load: Load, seconds: number) {
  const result = await autocannon({
    url: `${baseUrl}${load.path}`,
    connections: CONNECTIONS,
    duration: seconds,
    method: load.method ?? 'GET',
    headers: load.headers,
    body: load.body,
  });
  const ok = Object.entries(result.statusCodeStats ?? {})
    .filter(([code]) => code.startsWith('2'))
    .reduce((s, [, v]) => s + Number(v.count), 0);
  return {
    perSecond: ok / result.duration,
    meanPerSecond: result.requests.average,
    latencyP50: result.latency.p50,
    latencyP99: result.latency.p99,
    non2xx: result.non2xx,
    errors: result.errors,
    timeouts: result.timeouts,
    bytesPerSecond: result.throughput.average,
  };
}

/**
 * `POST /api/v1/analyze` of the 50-primitive part against the liveness route, both under autocannon
 * (10 connections, 10 s, loopback) in the same run, after a short warm-up of each (JIT, worker start);
 * two alternating rounds, req/s averaged over them (each round is in the JSON; latencies are round 1's).
 */
export async function measureAnalyzeThroughput(baseUrl: string, table: BenchTable): Promise<Record<string, unknown>> {
  const session = await signInDesigner(baseUrl);
  const health: Load = { path: '/api/v1/health/live' };
  const analyze: Load = {
    path: '/api/v1/analyze',
    method: 'POST',
    body: JSON.stringify(editorBenchPart()),
    headers: { 'content-type': 'application/json', authorization: `Bearer ${session.token}` },
  };
  const probe = await fetch(`${baseUrl}${analyze.path}`, { method: 'POST', headers: analyze.headers, body: analyze.body });
  const report = (await probe.json()) as { mass?: number };
  if (probe.status !== 200 || typeof report.mass !== 'number')
    throw new Error(`POST /analyze answered ${probe.status}: ${JSON.stringify(report).slice(0, 300)}`);

  await hammer(baseUrl, health, 2);
  await hammer(baseUrl, analyze, 2);
  // Two rounds, alternating, so a burst of other load on a shared machine shows as a spread.
  const rounds: { health: Awaited<ReturnType<typeof hammer>>; analyze: Awaited<ReturnType<typeof hammer>>; ratio: number }[] = [];
  for (let round = 0; round < ROUNDS; round++) {
    const h = await hammer(baseUrl, health, SECONDS);
    const a = await hammer(baseUrl, analyze, SECONDS);
    rounds.push({ health: h, analyze: a, ratio: a.perSecond / h.perSecond });
  }
  // autocannon drops its connections at the bell, which cancels what the server was computing (a
  // task cancelled while it runs costs its worker thread); wait until an analysis answers again.
  for (let i = 0; i < 100; i++) {
    const again = await fetch(`${baseUrl}${analyze.path}`, { method: 'POST', headers: analyze.headers, body: analyze.body });
    await again.arrayBuffer();
    if (again.status === 200) break;
    await new Promise((r) => setTimeout(r, 100));
  }
  await new Promise((r) => setTimeout(r, 500));
  const pooled = (pick: (r: (typeof rounds)[number]) => Awaited<ReturnType<typeof hammer>>) => ({
    ...pick(rounds[0]),
    perSecond: rounds.reduce((sum, r) => sum + pick(r).perSecond, 0) / rounds.length,
    non2xx: rounds.reduce((sum, r) => sum + pick(r).non2xx, 0),
    errors: rounds.reduce((sum, r) => sum + pick(r).errors, 0),
  });
  const h = pooled((r) => r.health),
    a = pooled((r) => r.analyze);
  const ratio = a.perSecond / h.perSecond;
  const refused = (r: typeof h) => (r.non2xx || r.errors ? `; ${r.non2xx} non-2xx, ${r.errors} errors` : '');
  table.record(
    `GET /health/live, ${CONNECTIONS} connections, ${ROUNDS} × ${SECONDS} s`,
    h.perSecond,
    'req/s',
    `p50 ${h.latencyP50} ms, p99 ${h.latencyP99} ms${refused(h)}`,
  );
  table.record(
    `POST /analyze, 50 primitives, ${CONNECTIONS} conn., ${ROUNDS} × ${SECONDS} s`,
    a.perSecond,
    'req/s',
    `p50 ${a.latencyP50} ms, p99 ${a.latencyP99} ms${refused(a)}`,
  );
  table.record(
    'analyze ÷ health',
    ratio,
    '×',
    `${ratio >= THROUGHPUT_TARGET_RATIO ? `meets ≥ ${THROUGHPUT_TARGET_RATIO}` : `BELOW the ${THROUGHPUT_TARGET_RATIO} target`}; mean of ${ROUNDS} rounds (each ${rounds.map((r) => r.ratio.toFixed(2)).join(', ')})`,
  );
  return { rounds, health: h, analyze: a, ratio, requestBytes: analyze.body!.length, reportBytes: JSON.stringify(report).length };
}
