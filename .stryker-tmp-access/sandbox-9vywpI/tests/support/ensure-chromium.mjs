// @ts-nocheck
// Runs before `npm test`: the browser tests drive Debian's Chromium, which npm cannot install. Finds it at
// CHROMIUM_PATH or /usr/bin/chromium; failing that, as root on a machine with apt-get, installs Debian's
// `chromium` package and says so; otherwise stops with the one command to run. Plain JavaScript, no packages.
import { execFileSync, spawnSync } from 'node:child_process';
import { accessSync, constants } from 'node:fs';

const wanted = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

function executable(file) {
  try {
    accessSync(file, constants.X_OK);
    return true;
  } catch {
    return false;
  }
}

function hasCommand(name) {
  return spawnSync('sh', ['-c', `command -v ${name}`], { stdio: 'ignore' }).status === 0;
}

if (executable(wanted)) process.exit(0);

if (process.env.CHROMIUM_PATH) {
  console.error(`CHROMIUM_PATH is set to ${wanted}, which is not an executable file. Point it at Chromium, or unset it to use /usr/bin/chromium.`);
  process.exit(1);
}

const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
if (isRoot && hasCommand('apt-get')) {
  console.log("The browser tests need Chromium and /usr/bin/chromium is missing: installing Debian's chromium package (about a minute)…");
  try {
    execFileSync('apt-get', ['update', '-qq'], { stdio: 'inherit' });
    execFileSync('apt-get', ['install', '-y', '-qq', 'chromium'], {
      stdio: ['ignore', 'ignore', 'inherit'],
      env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' },
    });
  } catch {
    console.error('Installing chromium with apt-get failed; see the lines above. Install it by hand: apt-get install -y chromium');
    process.exit(1);
  }
  if (executable(wanted)) {
    console.log(`Chromium installed at ${wanted}.`);
    process.exit(0);
  }
  console.error(`apt-get finished but ${wanted} is still missing.`);
  process.exit(1);
}

console.error(
  `The browser tests need Debian's Chromium at ${wanted}, and it is not there. Install it with:\n\n  sudo apt-get install -y chromium\n\n` +
    '(or set CHROMIUM_PATH to a Chromium you have), then run npm test again.',
);
process.exit(1);
