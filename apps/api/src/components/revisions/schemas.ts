import { z } from 'zod';

import { revisionInputBaseSchema, revisionPatchBaseSchema } from '@polecourt/contracts';
import { requirementsSchema } from '@polecourt/spec';

// The engine's own requirements schema inside the request bodies, so a bad
// limit comes back as a 400 naming e.g. `requirements.maxOvershootPct`.
export const createRevisionSchema = revisionInputBaseSchema.extend({ requirements: requirementsSchema }).strict();

export const patchRevisionSchema = revisionPatchBaseSchema
  .extend({ requirements: requirementsSchema.optional() })
  .strict()
  .refine((v) => v.requirements !== undefined || v.rationale !== undefined, { message: 'Nothing to change: send requirements or rationale' });

export const diffQuerySchema = z
  // Not strict: unknown query keys are ignored on every route.
  .object({ against: z.coerce.number({ message: 'against must be a revision id' }).int('against must be a revision id').positive('against must be a revision id').optional() });
