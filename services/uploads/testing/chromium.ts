import { chromium, type Browser } from 'playwright-core';

// Debian's chromium, never a downloaded one; the flags keep it from reaching for the network
// (see the project's stack notes).
const CHROMIUM_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export function launchChromium(): Promise<Browser> {
  return chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', headless: true, args: CHROMIUM_ARGS });
}
