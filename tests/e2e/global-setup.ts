import { build } from 'vite';

/** Browser tests run against the production build, as `npm start` serves it. */
export default async function setup(): Promise<void> {
  // vitest sets NODE_ENV=test, which would make Vite bundle React's development build.
  const previous = process.env.NODE_ENV;
  process.env.NODE_ENV = 'production';
  try {
    await build({ mode: 'production', logLevel: 'warn' });
  } finally {
    process.env.NODE_ENV = previous;
  }
}
