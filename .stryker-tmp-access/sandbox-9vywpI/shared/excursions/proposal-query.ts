/**
 * The operator's proposal as the API reads it from the address (all optional; the run's own values fill
 * in): one zod schema for the server and the client form. Every message names the field and the value.
 */
// @ts-nocheck

import { z } from 'zod';
import { ENVELOPE_PRESETS, type EnvelopeLimits } from '../scenario/envelopes';

/** Envelope choices: a preset id, or 'run' for the run's own envelope. */
export const RUN_ENVELOPE = 'run';
export const RECOMMENDED_PRESET_IDS = ENVELOPE_PRESETS.filter((p) => p.id.includes('recommended')).map((p) => p.id);
export const ALLOWABLE_PRESET_IDS = ENVELOPE_PRESETS.filter((p) => !p.id.includes('recommended')).map((p) => p.id);
export const DEFAULT_RECOMMENDED_ID = 'ashrae-2021-recommended';
export const DEFAULT_ALLOWABLE_ID = 'ashrae-2021-a1';

const SUPPLY_MIN_C = 5;
const SUPPLY_MAX_C = 45;

const celsius = () => {
  const message = (input: unknown) => `must be a number from ${SUPPLY_MIN_C} to ${SUPPLY_MAX_C} °C (got ${JSON.stringify(input)})`;
  return z.preprocess(
    // A text that is not a number stays text, so the message shows what was sent.
    (v) => (typeof v === 'string' && v.trim() !== '' && Number.isFinite(Number(v)) ? Number(v) : v),
    z
      .number({ error: (issue) => message(issue.input) })
      .min(SUPPLY_MIN_C, { error: (issue) => message(issue.input) })
      .max(SUPPLY_MAX_C, { error: (issue) => message(issue.input) }),
  );
};

const envelopeChoice = (ids: readonly string[]) =>
  z.string().refine((v) => v === RUN_ENVELOPE || ids.includes(v), {
    error: (issue) => `must be '${RUN_ENVELOPE}' or one of ${ids.join(', ')} (got ${JSON.stringify(issue.input)})`,
  });

export const proposalQuerySchema = z
  .object({
    supplyAirC: celsius().optional(),
    floatUpToC: celsius().optional(),
    control: envelopeChoice(ENVELOPE_PRESETS.map((p) => p.id)).optional(),
    recommended: envelopeChoice(RECOMMENDED_PRESET_IDS).optional(),
    allowable: envelopeChoice(ALLOWABLE_PRESET_IDS).optional(),
  })
  .strict()
  .refine((q) => q.floatUpToC === undefined || q.supplyAirC === undefined || q.floatUpToC >= q.supplyAirC, {
    error: (issue) => {
      const q = issue.input as { floatUpToC?: number; supplyAirC?: number };
      return `must be at or above supplyAirC ${q.supplyAirC} °C (got ${q.floatUpToC})`;
    },
    path: ['floatUpToC'],
  });

export type ProposalQuery = z.infer<typeof proposalQuerySchema>;

/** An envelope as the analysis applied it: a preset with its edition and source note, or the run's own. */
export interface ChosenEnvelope {
  id: string;
  label: string;
  edition: string | null;
  note: string | null;
  recalledFromMemory: boolean;
  limits: EnvelopeLimits;
}
