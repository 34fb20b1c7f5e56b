// Debian's chromium through playwright-core, with the flags this offline machine needs
// (no background networking, no component updates, no sync); playwright gives it a fresh
// temporary profile.
import { chromium } from 'playwright-core';

export const CHROMIUM = process.env.SUBLEVEL_CHROMIUM ?? '/usr/bin/chromium';

export function launchChromium() {
  return chromium.launch({
    executablePath: CHROMIUM,
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
}
