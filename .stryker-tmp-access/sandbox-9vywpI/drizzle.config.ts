// @ts-nocheck
import { defineConfig } from 'drizzle-kit';

export default defineConfig({
  dialect: 'sqlite',
  schema: './server/db/schema/index.ts',
  out: './drizzle',
  casing: 'snake_case',
  dbCredentials: { url: process.env.TRAMONTANE_DATA_DIR ? `${process.env.TRAMONTANE_DATA_DIR}/tramontane.db` : './data/tramontane.db' },
});
