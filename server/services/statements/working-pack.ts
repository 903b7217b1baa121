import { createHash } from 'node:crypto';
import type { Step } from '@shared/engine/working.ts';
import { packWorking, type SkeletonJson, type StoredWorking } from '@shared/statements/working-codec.ts';

// The same few hundred skeletons come back statement after statement: hash each once.
const known = new Map<SkeletonJson, string>();
const KNOWN_LIMIT = 5000;

/** A skeleton's id: 128 bits of its SHA-256, base64url (22 characters). */
export function skeletonId(json: SkeletonJson): string {
  let id = known.get(json);
  if (id === undefined) {
    id = createHash('sha256').update(json).digest('base64url').slice(0, 22);
    if (known.size >= KNOWN_LIMIT) known.delete(known.keys().next().value as SkeletonJson);
    known.set(json, id);
  }
  return id;
}

/**
 * Packs a working for storage (see working-codec.ts); the skeletons must be saved with
 * saveSkeletons (working-store.ts) in the transaction that writes the working.
 * @param steps the working
 * @returns the packed working and the skeletons it refers to
 */
export function packForStorage(steps: Step[]): { stored: StoredWorking; skeletons: Map<string, SkeletonJson> } {
  return packWorking(steps, skeletonId);
}
