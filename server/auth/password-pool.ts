import os from 'node:os';
import { Piscina } from 'piscina';
import { config } from '../config.ts';
import { HttpError } from '../errors.ts';

let pool: Piscina | undefined;

/** How many hashes may run at once: one thread per core but one, at least one, at most the setting. */
function threadCount(): number {
  return Math.max(1, Math.min(config.passwordHashThreads, os.availableParallelism() - 1 || 1));
}

function getPool(): Piscina {
  pool ??= new Piscina({
    filename: new URL('./hash-worker.mjs', import.meta.url).href,
    minThreads: 0,
    maxThreads: threadCount(),
    maxQueue: config.passwordHashQueue,
    idleTimeout: 30_000,
    // The worker is plain JavaScript: no TypeScript loader needed in the thread.
    execArgv: [],
  });
  return pool;
}

/** Seconds a refused caller is told to wait. */
export const BUSY_RETRY_SECONDS = 5;

/**
 * Recent time one hash job takes (ms), smoothed; until a job was timed, a pessimistic guess for
 * cost 11 on a slow machine (the server times one before it listens: warmPasswordHashing).
 */
let typicalJobMs = 500;
let timed = false;

const busy = () =>
  new HttpError(429, 'busy', 'Too many people are signing in at this moment. Try again in a few seconds.', undefined, {
    retryAfterSeconds: BUSY_RETRY_SECONDS,
  });

/** Sign-ins admitted and not yet answered (each needs one hash job). */
let signInsInFlight = 0;

function expectedWaitMs(jobsAhead: number, threads: number): number {
  return (Math.max(0, jobsAhead - threads + 1) * typicalJobMs) / threads;
}

/** True when a sign-in arriving now would be refused by tryAdmitSignIn (its hash would wait too long). */
export function signInWouldWaitTooLong(): boolean {
  const threads = Math.max(1, getPool().options.maxThreads);
  // With a thread free the hash waits for nothing: a lone sign-in is never refused, however slow the machine.
  return signInsInFlight >= threads && expectedWaitMs(signInsInFlight + 1, threads) > config.passwordHashMaxWaitMs;
}

/** The answer to a sign-in refused because hashing is booked up (429 `busy`, Retry-After). */
export const signInBusyError = busy();

/** An admitted sign-in's place: its turn to run, and giving the place back. */
export interface SignInTicket {
  /**
   * Calls `go` when it is this sign-in's turn to run: at once while fewer sign-ins are running than
   * there are hashing threads, plus one to have its database work done when a thread comes free.
   * The others wait in arrival order, holding nothing but their unread request.
   */
  whenItsTurn(go: () => void): void;
  /** Gives the place back: once the sign-in has its answer, or its connection dropped. */
  release(): void;
}

/** Admitted sign-ins running now, and those waiting for their turn (first come, first served). */
let signInsRunning = 0;
const waitingTurns: Array<() => void> = [];

function startWaitingSignIns(): void {
  const threads = Math.max(1, getPool().options.maxThreads);
  while (signInsRunning < threads + 1 && waitingTurns.length > 0) waitingTurns.shift()!();
}

/**
 * Admits one sign-in before it does any other work, or refuses it (undefined) when its hash would
 * wait longer than `passwordHashMaxWaitMs` behind the sign-ins already admitted; so excess sign-ins
 * cost almost nothing and the admitted ones finish in a bounded time. Taken at the door of the app
 * (`admitSignInRequest`, mounted first in app.ts), before the body is read. Refusing throws
 * nothing: an Error's stack trace is a good part of the cost of a refusal.
 *
 * Admitted sign-ins then run a few at a time (`whenItsTurn`): a burst's admitted sign-ins would
 * otherwise all parse their bodies, load sessions, open database connections and query at once,
 * in the same turns of the event loop as the burst's refusals, only to queue for the hashing
 * threads; taking turns spreads that work over the time the hashing takes anyway.
 * @returns the sign-in's ticket; undefined when refused
 */
export function tryAdmitSignIn(): SignInTicket | undefined {
  if (signInWouldWaitTooLong()) return undefined;
  signInsInFlight += 1;
  let released = false;
  let running = false;
  let turn: (() => void) | undefined;
  return {
    whenItsTurn(go) {
      turn = () => {
        running = true;
        signInsRunning += 1;
        go();
      };
      waitingTurns.push(turn);
      startWaitingSignIns();
    },
    release() {
      if (released) return;
      released = true;
      signInsInFlight -= 1;
      if (running) {
        signInsRunning -= 1;
        startWaitingSignIns();
      } else if (turn) waitingTurns.splice(waitingTurns.indexOf(turn), 1);
    },
  };
}

/**
 * Runs one bcrypt job in the worker pool, off the thread that answers requests. A job that would
 * wait longer than `passwordHashMaxWaitMs` for a thread (judged from how long recent jobs took), or
 * find the queue full, is refused at once (429 `busy` with Retry-After) instead of waiting.
 * @throws HttpError 429 `busy`
 */
export async function runHashJob<R>(
  task: { op: 'hash'; password: string; cost: number } | { op: 'compare'; password: string; hash: string },
): Promise<R> {
  const p = getPool();
  const threads = Math.max(1, p.options.maxThreads);
  if (p.queueSize > 0 && expectedWaitMs(p.queueSize + threads, threads) > config.passwordHashMaxWaitMs) throw busy();
  try {
    const { result, ms } = (await p.run(task)) as { result: R; ms: number };
    typicalJobMs = timed ? 0.8 * typicalJobMs + 0.2 * ms : ms;
    timed = true;
    return result;
  } catch (err) {
    if (err instanceof Error && /queue is at limit|No task queue available/i.test(err.message)) throw busy();
    throw err;
  }
}

/** How many hash jobs the pool has finished since it started (tests count comparisons with it). */
export function hashJobsCompleted(): number {
  return pool?.completed ?? 0;
}

/** Stops the worker threads (shutdown, tests). */
export async function closePasswordPool(): Promise<void> {
  const p = pool;
  pool = undefined;
  timed = false;
  typicalJobMs = 500;
  await p?.destroy();
}
