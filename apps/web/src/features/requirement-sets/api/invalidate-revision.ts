import type { Revision } from '@polecourt/contracts';
import type { QueryClient } from '@tanstack/react-query';

import { getRequirementSetQueryOptions } from './get-requirement-set';
import { getRevisionQueryOptions } from './get-revision';

/**
 * After a state change (submit, approve, retire): the revision itself, its diff and impact,
 * the other revisions of its set (approval retires the one in force) and the summaries.
 */
export async function invalidateRevision(queryClient: QueryClient, revision: Revision): Promise<void> {
  queryClient.setQueryData(getRevisionQueryOptions(revision.id).queryKey, revision);
  await Promise.all([
    queryClient.invalidateQueries({ queryKey: ['revisions'] }),
    queryClient.invalidateQueries({ queryKey: getRequirementSetQueryOptions(revision.requirementSetId).queryKey }),
    queryClient.invalidateQueries({ queryKey: ['requirement-sets', 'by-line'] }),
  ]);
}
