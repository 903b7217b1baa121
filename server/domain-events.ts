import type { EventEmitter } from 'node:events';

/**
 * Emits a domain event and waits for every listener that returns a promise, so a failure reaches
 * the caller (EventEmitter's own `emit` neither waits nor sees a rejected promise).
 * @param emitter the domain's events
 * @param name the event
 * @param args what it carries
 */
export async function emitAndWait<M extends Record<keyof M, unknown[]>, K extends keyof M & string>(
  emitter: EventEmitter<M>,
  name: K,
  ...args: M[K]
): Promise<void> {
  const listeners = (emitter as unknown as EventEmitter).listeners(name) as ((...a: M[K]) => unknown)[];
  await Promise.all(listeners.map((listener) => listener(...args)));
}
