import { type ChildProcess, spawn, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';

/** Whether Debian's haproxy is installed (the cluster test needs it; `.ci/run` installs it). */
export function haproxyInstalled(): boolean {
  return spawnSync('sh', ['-c', 'command -v haproxy || test -x /usr/sbin/haproxy'], { encoding: 'utf8' }).status === 0;
}

const binary = () => (fs.existsSync('/usr/sbin/haproxy') ? '/usr/sbin/haproxy' : 'haproxy');

/** What the balancer fronts: the web servers take requests; the worker is only health-checked. */
export interface BalancerPlan {
  port: number;
  statsPort: number;
  web: { name: string; port: number }[];
  worker: { name: string; port: number };
}

/**
 * The test's HAProxy configuration, the same rules as `server/deploy/haproxy.cfg`: round robin
 * without stickiness (any web server serves any session), health checks on /api/health every
 * second (300 ms once one failed), a request whose connection failed is sent to another server (`option redispatch`,
 * `retry-on conn-failure`), and a GET or HEAD whose server died before answering is retried too.
 */
export function haproxyConfig(plan: BalancerPlan): string {
  const servers = plan.web.map((s) => `  server ${s.name} 127.0.0.1:${s.port} check`).join('\n');
  return `global
  maxconn 512

defaults
  mode http
  log stdout format raw local0 warning
  option httplog
  timeout connect 2s
  timeout client 30s
  timeout server 30s
  timeout queue 10s
  timeout check 3s
  retries 3
  option redispatch 1
  retry-on conn-failure empty-response response-timeout
  default-server inter 1s fastinter 300ms downinter 1s fall 2 rise 1

frontend public
  bind 127.0.0.1:${plan.port}
  option forwardfor
  default_backend web

backend web
  balance roundrobin
  option httpchk GET /api/health
  http-check expect status 200
  # only a request that never reached a server may be sent again if it changes something
  http-request disable-l7-retry unless METH_GET || METH_HEAD
${servers}

backend worker
  option httpchk GET /api/health
  http-check expect status 200
  server ${plan.worker.name} 127.0.0.1:${plan.worker.port} check

frontend stats
  bind 127.0.0.1:${plan.statsPort}
  stats enable
  stats uri /stats
`;
}

/** A running HAProxy in the foreground, stopped with the test. */
export async function startHaproxy(plan: BalancerPlan, folder: string): Promise<{ child: ChildProcess; output: () => string }> {
  const file = path.join(folder, 'haproxy.cfg');
  fs.writeFileSync(file, haproxyConfig(plan));
  const check = spawnSync(binary(), ['-c', '-f', file], { encoding: 'utf8' });
  if (check.status !== 0) throw new Error(`haproxy refused its configuration:\n${check.stdout}${check.stderr}`);
  const child = spawn(binary(), ['-db', '-f', file], { stdio: ['ignore', 'pipe', 'pipe'] });
  let output = '';
  child.stdout!.on('data', (c: Buffer) => (output += c.toString()));
  child.stderr!.on('data', (c: Buffer) => (output += c.toString()));
  return { child, output: () => output };
}

/** Each server's state (UP, DOWN, ...) by name, from HAProxy's CSV statistics. */
export async function serverStates(statsPort: number): Promise<Record<string, string>> {
  const csv = await (await fetch(`http://127.0.0.1:${statsPort}/stats;csv`)).text();
  const states: Record<string, string> = {};
  for (const line of csv.split('\n').slice(1)) {
    const cells = line.split(',');
    if (cells[1] && cells[1] !== 'FRONTEND' && cells[1] !== 'BACKEND') states[cells[1]] = cells[17] ?? '';
  }
  return states;
}
