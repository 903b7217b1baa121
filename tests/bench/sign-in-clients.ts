/**
 * The 200 browsers of `npm run bench:sign-in`, in a process of their own that the benchmark starts
 * under `nice -n 10` (Linux): they stand in for browsers on other machines, so they take a core
 * only when the server's threads do not want it. Every thread of this process is niced, the V8
 * helper threads that collect its garbage included (in a worker thread of the benchmark's own
 * process they ran at full priority and took cores from the server in the middle of the burst).
 *
 * Over IPC: receives `{ base, emails, password }`; each client first loads a page, as a browser
 * loads the sign-in form before it sends it, so each holds its own kept-alive connection; answers
 * `'ready'` (with `freshConnections`, one page load only, so the burst opens its own connections);
 * on `'go'` sends every sign-in at once and answers with the results.
 */
interface Job {
  base: string;
  emails: string[];
  password: string;
  /** Skip loading a page first: each sign-in opens its connection in the burst (the harsher case). */
  freshConnections: boolean;
}
export interface SignInResult {
  status: number;
  code: string;
  ms: number;
  retryAfter: string | null;
}

async function signIn(base: string, email: string, password: string): Promise<SignInResult> {
  const t0 = performance.now();
  const res = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  const body = await res.text();
  let code = '';
  try {
    code = JSON.parse(body).error?.code ?? '';
  } catch {
    // Not JSON: the status says enough.
  }
  return { status: res.status, code, ms: performance.now() - t0, retryAfter: res.headers.get('retry-after') };
}

let job: Job | undefined;
process.on('message', async (message: Job | 'go') => {
  if (message !== 'go') {
    job = message;
    const { base, freshConnections, emails } = message;
    // Also compiles fetch and its parser before the burst, on a path the benchmark does not count.
    const pageLoads = freshConnections ? 1 : emails.length;
    await Promise.all(Array.from({ length: pageLoads }, () => fetch(`${base}/api/health`).then((r) => r.arrayBuffer())));
    process.send?.('ready');
    return;
  }
  const { base, emails, password } = job!;
  const results = await Promise.all(emails.map((email) => signIn(base, email, password)));
  process.send?.(results, () => process.exit(0));
});
