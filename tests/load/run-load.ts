import autocannon from 'autocannon';
import { writeReadmeSection } from '../helpers/readme-section';
import { startServer } from '../helpers/server';

// A mix of signed-in reads and writes against the real server on loopback, for DURATION_S seconds.
const DURATION_S = Number(process.env.LOAD_DURATION_S ?? 60);
const CONNECTIONS = Number(process.env.LOAD_CONNECTIONS ?? 10);
const RATE = Number(process.env.LOAD_RATE ?? 250);

const percentile = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];

const server = await startServer({ DEMO_PARTICLES: '2000' });
try {
  const login = await fetch(`${server.url}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', Origin: server.url },
    body: JSON.stringify({ email: 'engineer@motewalk.local', password: 'demo-engineer-pass' }),
  });
  const cookie = login.headers.get('set-cookie')!.split(';')[0];
  const scenarios = (await (await fetch(`${server.url}/api/scenarios`, { headers: { Cookie: cookie } })).json()).items as { id: number }[];
  const ws = (await (await fetch(`${server.url}/api/sites`, { headers: { Cookie: cookie } })).json()).items[0].rooms[0].workstations[0].id;
  const headers = { Cookie: cookie, Origin: server.url, 'Content-Type': 'application/json' };
  let n = 0;
  console.log(
    `Load: ${RATE} requests/s offered over ${CONNECTIONS} connections for ${DURATION_S} s against ${server.url} (reads 80 %, writes 20 %)`,
  );
  const latencies: number[] = [];
  let finish: (r: autocannon.Result) => void = () => {};
  const done = new Promise<autocannon.Result>((resolve) => (finish = resolve));
  const instance = autocannon(
    {
      url: server.url,
      connections: CONNECTIONS,
      overallRate: RATE,
      duration: DURATION_S,
      headers,
      requests: [
        { method: 'GET', path: '/api/scenarios?sort=name&order=asc' },
        { method: 'GET', path: `/api/scenarios/${scenarios[0].id}` },
        { method: 'GET', path: `/api/workstations/${ws}` },
        { method: 'GET', path: '/api/agents' },
        {
          method: 'POST',
          path: '/api/sites',
          setupRequest: (req) => ({ ...req, body: JSON.stringify({ name: `Load site ${(n += 1)}`, data: { address: 'loopback' } }) }),
        },
      ],
    },
    (err, r) => {
      if (err) throw err;
      finish(r);
    },
  );
  instance.on('response', (_client: unknown, _status: number, _bytes: number, ms: number) => latencies.push(ms));
  const result = await done;
  latencies.sort((a, b) => a - b);
  const [p50, p95, p99] = [50, 95, 99].map((p) => percentile(latencies, p));
  const errors = result.errors + result.timeouts + result.non2xx;
  console.log(`requests/s: ${result.requests.average.toFixed(0)} (total ${result.requests.total})`);
  console.log(`latency ms: p50 ${p50.toFixed(1)}, p95 ${p95.toFixed(1)}, p99 ${p99.toFixed(1)} (${latencies.length} responses)`);
  console.log(`errors: ${errors} (socket ${result.errors}, timeouts ${result.timeouts}, non-2xx ${result.non2xx})`);
  const ok = result.requests.average >= 200 && p95 < 50 && errors === 0;
  if (process.argv.includes('--readme')) {
    writeReadmeSection('load', [
      `- ${RATE} requests/s offered over ${CONNECTIONS} connections for ${DURATION_S} s: **${result.requests.average.toFixed(0)} requests/s** sustained`,
      `- latency p50 ${p50.toFixed(1)} ms, **p95 ${p95.toFixed(1)} ms**, p99 ${p99.toFixed(1)} ms; errors ${errors}`,
      `- ${ok ? 'target met' : 'target NOT met'}`,
    ]);
  }
  console.log(
    ok
      ? 'Target met: >= 200 requests/s sustained, p95 < 50 ms, no errors'
      : 'Target NOT met: >= 200 requests/s with p95 < 50 ms and no errors',
  );
  process.exitCode = ok ? 0 : 1;
} finally {
  await server.stop();
}
