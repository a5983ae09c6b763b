import LRUCache from 'lru-cache';

import { revisionRepository, type RevisionRecord } from './repository.js';

// Approved and retired revisions, by id: the database freezes their content
// (triggers refuse any change), so a read of one can be kept for good. Only an
// approved revision's status can still move on (to retired): whoever acts on
// the status checks it again under a lock.
const kept = new LRUCache<number, RevisionRecord>({ max: 5_000 });

/** The revision, from the kept reads when it is frozen; null when there is none. */
export async function findRevisionKept(id: number): Promise<RevisionRecord | null> {
  const hit = kept.get(id);
  if (hit) return hit;
  const revision = await revisionRepository.findById(id);
  if (revision && (revision.status === 'approved' || revision.status === 'retired')) kept.set(id, revision);
  return revision;
}
