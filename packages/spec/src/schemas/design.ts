// zod schemas of a design (a candidate's closed-loop model), shared by the
// API and the web forms. They check shapes and finite numbers only; the
// deeper rules (conjugate pairs, properness, a non-zero gain, leading
// coefficients) live in parse-design, which every caller runs afterwards.
import { z } from 'zod';
import { MAX_MODEL_ORDER } from '../max-model-order.js';

// zod 4's z.number() already refuses NaN and +-Infinity.
export const complexSchema = z.strictObject({
  re: z.number(),
  im: z.number(),
});

const idSchema = z.string().max(200).optional();

export const zpkDesignSchema = z.strictObject({
  id: idSchema,
  poles: z.array(complexSchema).max(MAX_MODEL_ORDER),
  zeros: z.array(complexSchema).max(MAX_MODEL_ORDER).optional(),
  gain: z.number(),
});

export const polynomialDesignSchema = z.strictObject({
  id: idSchema,
  numerator: z.array(z.number()).min(1).max(MAX_MODEL_ORDER + 1),
  denominator: z.array(z.number()).min(1).max(MAX_MODEL_ORDER + 1),
});

export const designSchema = z.union([zpkDesignSchema, polynomialDesignSchema]);

export type DesignSchemaInput = z.infer<typeof designSchema>;
