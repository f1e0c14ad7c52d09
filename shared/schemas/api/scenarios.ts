/** Answers of the scenario routes (server/routes/scenarios.ts). */
import { z } from 'zod';
import { scenarioSchema } from '../../scenario/schema';
import { idSchema, isoTimeSchema, modeHoursSchema } from './common';

/** One retired input the start-up migration replaced, as the server recorded it. */
// before or after is absent where the input was added or removed (JSON leaves out undefined).
export const scenarioChangeSchema = z.object({ path: z.string(), before: z.unknown().optional(), after: z.unknown().optional(), note: z.string() });
export type ScenarioChange = z.infer<typeof scenarioChangeSchema>;

/** What the start-up migration changed; the editor shows it until an engineer or owner dismisses it. */
export const scenarioMigrationSchema = z.object({
  migratedAt: z.string(),
  changes: z.array(scenarioChangeSchema),
  dismissedAt: z.string().nullable(),
  dismissedBy: idSchema.nullable(),
});

export const storedScenarioSchema = z.object({
  id: idSchema,
  projectId: idSchema,
  name: z.string(),
  createdBy: idSchema.nullable(),
  createdAt: isoTimeSchema,
  updatedAt: isoTimeSchema,
  scenario: scenarioSchema,
  /** Null if the scenario was never migrated. */
  migration: scenarioMigrationSchema.nullable(),
});
export type StoredScenario = z.infer<typeof storedScenarioSchema>;

export const scenarioListResponse = z.object({ scenarios: z.array(storedScenarioSchema) });
export const scenarioResponse = z.object({ scenario: storedScenarioSchema });

/** POST …/scenarios/preview: hours per mode while the scenario is edited, never stored. */
export const scenarioPreviewResponse = z.object({
  hours: modeHoursSchema,
  modes: z.array(z.string()),
  energy: z.looseObject({ coolingKwh: z.number(), partialPue: z.number().nullable() }),
  water: z.looseObject({ totalL: z.number(), wueLPerKwh: z.number().nullable() }),
  /** A hybrid hall's loops, their hours only. */
  loops: z.object({ liquid: z.object({ hours: modeHoursSchema }), air: z.object({ hours: modeHoursSchema }) }).optional(),
});
export type ScenarioPreview = z.infer<typeof scenarioPreviewResponse>;
