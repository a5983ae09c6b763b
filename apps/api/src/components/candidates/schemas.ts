import { z } from 'zod';

import { candidateInputBaseSchema } from '@polecourt/contracts';

// The design itself is checked by the engine's parseDesign (which names the
// field, e.g. design.poles[1].im); here only that the member is present.
export const candidateInputSchema = candidateInputBaseSchema.extend({ design: z.unknown() }).strict();
