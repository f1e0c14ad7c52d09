/**
 * A closed-loop HTTP load, run in a worker thread by load.bench.ts so the load's own work does not share the
 * served app's event loop (plain JavaScript: worker threads do not get tsx's loader). `connections` keep-alive
 * connections each send their next GET as soon as the last answer has arrived, for `durationMs`. A request with
 * no complete answer within `timeoutMs` counts as a timeout and its connection is replaced.
 * workerData: { port, path, headers, connections, durationMs, timeoutMs }; posts back
 * { requests, errors, timeouts, bytes, elapsedMs, latenciesMs } (errors: answers other than 200, and failed
 * connections; latenciesMs: every completed request's latency).
 */
// @ts-nocheck

import http from 'node:http';
import { parentPort, workerData } from 'node:worker_threads';

async function load(options) {
  const agent = new http.Agent({ keepAlive: true, maxSockets: options.connections });
  const outcome = { requests: 0, errors: 0, timeouts: 0, bytes: 0, elapsedMs: 0, latenciesMs: [] };
  const start = performance.now();
  const deadline = start + options.durationMs;

  const once = () =>
    new Promise((resolve) => {
      const sentAt = performance.now();
      const request = http.get({ host: '127.0.0.1', port: options.port, path: options.path, agent, headers: options.headers }, (response) => {
        response.on('data', (chunk) => {
          outcome.bytes += chunk.length;
        });
        response.on('end', () => {
          outcome.requests++;
          outcome.latenciesMs.push(performance.now() - sentAt);
          if (response.statusCode !== 200) outcome.errors++;
          resolve();
        });
      });
      let timedOut = false;
      request.setTimeout(options.timeoutMs, () => {
        timedOut = true;
        outcome.timeouts++;
        request.destroy();
      });
      request.on('error', () => {
        // A timed-out request ends here too, after its destroy(); it is counted once, as a timeout.
        if (!timedOut) outcome.errors++;
        resolve();
      });
    });

  const connection = async () => {
    while (performance.now() < deadline) await once();
  };
  await Promise.all(Array.from({ length: options.connections }, connection));
  outcome.elapsedMs = performance.now() - start;
  agent.destroy();
  return outcome;
}

parentPort?.postMessage(await load(workerData));
