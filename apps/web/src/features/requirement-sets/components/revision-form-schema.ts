import { REQUIREMENT_FIELDS, type RequirementField, rationaleSchema } from '@polecourt/contracts';
import { type RequirementsInput, requirementsSchema } from '@polecourt/spec';
import { z } from 'zod';

import { parseNumberInput } from '@/lib/format';

// The revision editor's form: every limit is typed as text (so 0.5 and 5e-1 both work) and
// turned into numbers here, then checked by the engine's own requirementsSchema, so the
// messages under the inputs are the ones the API would give (`requirements.maxOvershootPct`).

export const BAND_CHOICES = ['2', '5', 'other'] as const;
export type BandChoice = (typeof BAND_CHOICES)[number];

export type RequirementTexts = Record<RequirementField, string>;

export interface RevisionFormValues {
  requirements: RequirementTexts;
  bandChoice: BandChoice;
  rationale: string;
}

export interface RevisionFormOutput {
  requirements: RequirementsInput;
  rationale: string;
}

const textFields = z.object(Object.fromEntries(REQUIREMENT_FIELDS.map((f) => [f, z.string()])) as Record<RequirementField, z.ZodString>);

/** Blank means "no such limit"; text that is not a number becomes NaN, which the engine's schema refuses with the field's message. */
export function textsToRequirements(texts: RequirementTexts, band: BandChoice): Record<string, number> {
  const out: Record<string, number> = {};
  for (const field of REQUIREMENT_FIELDS) {
    if (field === 'settlingBandPct' && band !== 'other') {
      out.settlingBandPct = Number(band);
      continue;
    }
    const text = texts[field].trim();
    if (text === '') continue;
    out[field] = parseNumberInput(text) ?? Number.NaN;
  }
  return out;
}

export const revisionFormSchema = z
  .object({ requirements: textFields, bandChoice: z.enum(BAND_CHOICES), rationale: z.string() })
  .transform((v) => ({ requirements: textsToRequirements(v.requirements, v.bandChoice), rationale: v.rationale }))
  .pipe(z.object({ requirements: requirementsSchema, rationale: rationaleSchema }));

export type RevisionFormSchema = typeof revisionFormSchema;

/** Form values from stored requirements: the revision in force for a new one, the draft itself when editing. */
export function formValuesFrom(requirements: Record<string, number> | null, rationale: string): RevisionFormValues {
  const texts = Object.fromEntries(REQUIREMENT_FIELDS.map((f) => [f, ''])) as RequirementTexts;
  for (const field of REQUIREMENT_FIELDS) {
    const v = requirements?.[field];
    if (v !== undefined) texts[field] = String(v);
  }
  // A first revision starts from the usual settings: the 2 % band and a dominance ratio of 5.
  if (!requirements) texts.dominanceRatio = '5';
  const band = requirements?.settlingBandPct ?? 2;
  const bandChoice: BandChoice = band === 2 ? '2' : band === 5 ? '5' : 'other';
  if (bandChoice !== 'other') texts.settlingBandPct = '';
  return { requirements: texts, bandChoice, rationale };
}
