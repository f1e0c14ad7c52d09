// @ts-nocheck
import type { Test } from 'supertest';

/** A supertest parser that keeps the response body as the bytes sent: `.buffer(true).parse(rawBody)`. */
export const rawBody: Parameters<Test['parse']>[0] = (res, done) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => done(null, Buffer.concat(chunks)));
};
