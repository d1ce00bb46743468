import fs from 'node:fs';
import path from 'node:path';
import { type Browser, chromium } from 'playwright-core';

export const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

// Browser tests are mandatory under CI=true: a missing browser fails the run.
// Elsewhere they are skipped with a note when Chromium is not installed.
export function browserAvailable(): boolean {
  const ok = fs.existsSync(CHROMIUM);
  if (!ok && process.env.CI === 'true') throw new Error(`Chromium not found at ${CHROMIUM}; CI needs it (apt-get install -y chromium)`);
  if (!ok) console.warn(`[browser tests] skipped: no Chromium at ${CHROMIUM}`);
  return ok;
}

export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: CHROMIUM,
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
  });
}

export const ARTIFACTS = path.resolve(__dirname, '../../artifacts');
export function artifactPath(name: string): string {
  fs.mkdirSync(ARTIFACTS, { recursive: true });
  return path.join(ARTIFACTS, name);
}
