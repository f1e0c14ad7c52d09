// After a test run on CI: when a test process died under a file (vitest's "Worker exited unexpectedly"), say which
// file and tests never finished, the crash lines the process printed, and any Node diagnostic report it wrote, so
// the cause is in the part of the log that gets read.
// Usage: node .ci/unfinished.mjs <vitest JSON report> <captured test output> <Node report directory>
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';

const [reportFile, outputFile, reportDir] = process.argv.slice(2);

if (existsSync(reportFile)) {
  const report = JSON.parse(readFileSync(reportFile, 'utf8'));
  for (const file of report.testResults ?? []) {
    const name = path.relative(process.cwd(), file.name);
    const open = (file.assertionResults ?? []).filter((a) => a.status !== 'passed' && a.status !== 'failed' && a.status !== 'skipped');
    if (file.status !== 'passed' && file.status !== 'failed') console.log(`unfinished file: ${name} (status ${file.status})`);
    for (const a of open) console.log(`unfinished test: ${name} > ${a.fullName} (status ${a.status})`);
  }
}

if (existsSync(outputFile)) {
  const crash =
    /FATAL ERROR|Fatal error|Segmentation fault|SIGSEGV|SIGABRT|SIGBUS|Aborted|heap out of memory|Check failed|core dumped|Native stack|exited unexpectedly|EPIPE|ERR_IPC/;
  const lines = readFileSync(outputFile, 'utf8').split('\n');
  lines.forEach((line, i) => {
    if (crash.test(line)) console.log(`output line ${i + 1}: ${line.slice(0, 300)}`);
  });
}

if (reportDir && existsSync(reportDir)) {
  for (const file of readdirSync(reportDir).filter((f) => f.endsWith('.json'))) {
    const r = JSON.parse(readFileSync(path.join(reportDir, file), 'utf8'));
    console.log(`Node report ${file}: ${r.header?.event} (${r.header?.trigger}), command ${r.header?.commandLine?.join(' ')}`);
    console.log(`  JavaScript stack: ${(r.javascriptStack?.stack ?? []).slice(0, 8).join(' | ')}`);
  }
}
