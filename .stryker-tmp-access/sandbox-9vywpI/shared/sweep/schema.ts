/** The sweep request: which scenario on which climate file, and one or two inputs with their ranges. */
// @ts-nocheck

import { z } from 'zod';
import { withoutControlCharacters } from '../schemas/plain-text';
import { ENVELOPE_PRESETS } from '../scenario/envelopes';
import { SWEEP_INPUT_PATHS } from './inputs';
import { MAX_SWEEP_POINTS, rangeCount, sweepPointCount, type SweepAxis } from './expand';

const presetIds = ENVELOPE_PRESETS.map((p) => p.id);
const finite = (what: string) => z.number({ error: `${what} must be a number` }).refine(Number.isFinite, { error: `${what} must be a finite number` });

export const sweepAxisSchema = z
  .object({
    input: z.enum(SWEEP_INPUT_PATHS, { error: `input must be one of ${SWEEP_INPUT_PATHS.join(', ')}` }),
    from: finite('from').optional(),
    to: finite('to').optional(),
    step: finite('step').optional(),
    presetIds: z.array(z.string().max(80)).max(presetIds.length).optional(),
  })
  .superRefine((axis, ctx) => {
    if (axis.input === 'envelope.presetId') {
      if (!axis.presetIds?.length) {
        ctx.addIssue({ code: 'custom', path: ['presetIds'], message: 'list at least one envelope preset' });
        return;
      }
      for (const [i, id] of axis.presetIds.entries()) {
        if (!presetIds.includes(id))
          ctx.addIssue({ code: 'custom', path: ['presetIds', i], message: `"${id}" is not an envelope preset (${presetIds.join(', ')})` });
        else if (axis.presetIds.indexOf(id) !== i) ctx.addIssue({ code: 'custom', path: ['presetIds', i], message: `"${id}" is listed twice` });
      }
      return;
    }
    const { from, to, step } = axis;
    for (const key of ['from', 'to', 'step'] as const) {
      if (axis[key] === undefined) ctx.addIssue({ code: 'custom', path: [key], message: `${axis.input} needs ${key}` });
    }
    if (from === undefined || to === undefined || step === undefined) return;
    if (!(step > 0)) ctx.addIssue({ code: 'custom', path: ['step'], message: `step must be above 0, got ${step}` });
    else if (to < from) ctx.addIssue({ code: 'custom', path: ['to'], message: `to (${to}) must not be below from (${from})` });
    else if (rangeCount(from, to, step) > MAX_SWEEP_POINTS) {
      ctx.addIssue({
        code: 'custom',
        path: ['step'],
        message: `from ${from} to ${to} by ${step} gives ${rangeCount(from, to, step)} values; at most ${MAX_SWEEP_POINTS}`,
      });
    }
  })
  .transform((axis): SweepAxis =>
    axis.input === 'envelope.presetId'
      ? { input: axis.input, presetIds: axis.presetIds ?? [] }
      : { input: axis.input, from: axis.from!, to: axis.to!, step: axis.step! },
  );

export const sweepSpecSchema = z
  .object({
    name: z
      .string()
      .trim()
      .max(200, { error: 'name must be at most 200 characters' })
      .refine(...withoutControlCharacters('name'))
      .optional(),
    scenarioId: z.number({ error: 'scenarioId must be a scenario id' }).int().positive(),
    climateFileId: z.number({ error: 'climateFileId must be a climate file id' }).int().positive(),
    axes: z
      .array(sweepAxisSchema)
      .min(1, { error: 'axes must hold one input (a line) or two (a grid)' })
      .max(2, { error: 'axes must hold one input (a line) or two (a grid)' }),
  })
  .superRefine((spec, ctx) => {
    if (spec.axes.length === 2 && spec.axes[0].input === spec.axes[1].input) {
      ctx.addIssue({ code: 'custom', path: ['axes', 1, 'input'], message: `the two axes must be different inputs; both are ${spec.axes[0].input}` });
    }
    const count = sweepPointCount(spec.axes);
    if (count > MAX_SWEEP_POINTS) ctx.addIssue({ code: 'custom', path: ['axes'], message: `the sweep has ${count} points; at most ${MAX_SWEEP_POINTS}` });
  });

export type SweepSpec = z.output<typeof sweepSpecSchema>;
export type SweepSpecInput = z.input<typeof sweepSpecSchema>;
