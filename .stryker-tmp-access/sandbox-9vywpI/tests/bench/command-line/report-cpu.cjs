// @ts-nocheck
// Loaded with --require into every Node process a timed command starts (through NODE_OPTIONS): at exit, each appends
// the CPU time it used, in ms, to the file named by TRAMONTANE_BENCH_CPU_FILE, so the bench adds up what a command cost
// in CPU however many processes it took (npm, its shell's node, …) and however busy the machine was.
const { appendFileSync } = require('node:fs');

const file = process.env.TRAMONTANE_BENCH_CPU_FILE;
if (file) {
  process.once('exit', () => {
    const { user, system } = process.cpuUsage();
    appendFileSync(file, `${(user + system) / 1000}\n`);
  });
}
