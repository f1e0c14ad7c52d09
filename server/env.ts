import path from 'node:path';
import { z } from 'zod';

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  PORT: z.coerce.number().int().min(0).max(65_535).default(3000),
  HOST: z.string().min(1).default('127.0.0.1'),
  /** Folder holding the SQLite file and anything else the server keeps (keys, received mail). */
  TRAMONTANE_DATA_DIR: z.string().min(1).default('./data'),
  /** Worker threads for the hour classifier; 0 means one per core. */
  TRAMONTANE_WORKERS: z.coerce.number().int().min(0).max(256).default(0),
});

export type Env = z.infer<typeof envSchema> & { databaseFile: string };

/** Reads and checks the environment once at start-up; a bad value stops the server with every problem named. */
export function loadEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const problems = parsed.error.issues.map((issue) => `  ${issue.path.join('.')}: ${issue.message}`).join('\n');
    throw new Error(`The environment is not valid:\n${problems}`);
  }
  const dataDir = path.resolve(parsed.data.TRAMONTANE_DATA_DIR);
  return { ...parsed.data, TRAMONTANE_DATA_DIR: dataDir, databaseFile: path.join(dataDir, 'tramontane.db') };
}
