// Finds a Chromium or Chrome executable for the Playwright tests. Playwright's own browser
// downloads are never used (this machine cannot download them).
// Order: $TENUIS_CHROMIUM, /usr/bin/chromium, /usr/bin/chromium-browser, then google-chrome,
// google-chrome-stable, chromium or chromium-browser on PATH.
import { accessSync, constants } from 'node:fs';
import { delimiter, join } from 'node:path';

export const installHint =
  'No Chromium found for the browser tests. Install one with:\n' +
  '  apt-get install chromium\n' +
  '(or set TENUIS_CHROMIUM to the path of a Chromium or Chrome executable).';

function isExecutable(file) {
  try {
    accessSync(file, constants.X_OK);
    return true;
  } catch {
    return false;
  }
}

/** @returns {string | undefined} the path of a browser executable, or undefined. */
export function findChromium() {
  const fromEnv = process.env.TENUIS_CHROMIUM;
  if (fromEnv) {
    if (isExecutable(fromEnv)) return fromEnv;
    throw new Error(`TENUIS_CHROMIUM is set to ${fromEnv}, which is not an executable file.`);
  }
  for (const file of ['/usr/bin/chromium', '/usr/bin/chromium-browser']) {
    if (isExecutable(file)) return file;
  }
  const dirs = (process.env.PATH ?? '').split(delimiter).filter(Boolean);
  for (const name of ['google-chrome', 'google-chrome-stable', 'chromium', 'chromium-browser']) {
    for (const dir of dirs) {
      const file = join(dir, name);
      if (isExecutable(file)) return file;
    }
  }
  return undefined;
}

/** Like findChromium(), but throws with installHint when none is found. */
export function requireChromium() {
  const found = findChromium();
  if (!found) throw new Error(installHint);
  return found;
}
