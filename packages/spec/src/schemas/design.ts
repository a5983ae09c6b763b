// zod schemas of a design (a candidate's closed-loop model), shared by the
// API and the web forms. They check shapes and finite numbers only; the
// deeper rules (conjugate pairs, properness, a non-zero gain, leading
// coefficients) live in parse-design, which every caller runs afterwards.
// Named imports, not the z namespace: the namespace keeps all of zod (every
// locale, the JSON-schema tools) in a bundle, about 450 KB more to load.
import { array, number, strictObject, string, union } from 'zod';
import type { z } from 'zod';
import { MAX_MODEL_ORDER } from '../max-model-order.js';

// zod 4's number() already refuses NaN and +-Infinity.
export const complexSchema = strictObject({
  re: number(),
  im: number(),
});

const idSchema = string().max(200).optional();

export const zpkDesignSchema = strictObject({
  id: idSchema,
  poles: array(complexSchema).max(MAX_MODEL_ORDER),
  zeros: array(complexSchema).max(MAX_MODEL_ORDER).optional(),
  gain: number(),
});

export const polynomialDesignSchema = strictObject({
  id: idSchema,
  numerator: array(number()).min(1).max(MAX_MODEL_ORDER + 1),
  denominator: array(number()).min(1).max(MAX_MODEL_ORDER + 1),
});

export const designSchema = union([zpkDesignSchema, polynomialDesignSchema]);

export type DesignSchemaInput = z.infer<typeof designSchema>;
