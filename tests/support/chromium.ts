// Debian's Chromium, never a downloaded browser, launched the same way by the Playwright config,
// the benchmarks and the screenshot scripts. The flags keep it off the (closed) network; a root
// user needs --no-sandbox.
import { chromium, type LaunchOptions } from '@playwright/test';

export const chromiumArgs = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
  '--disable-quic',
];

export const chromiumLaunchOptions: LaunchOptions = {
  executablePath: process.env.HM_CHROMIUM ?? '/usr/bin/chromium',
  args: chromiumArgs,
};

/** Launches Debian's Chromium with the shared flags plus `extraArgs`. */
export function launchChromium(extraArgs: string[] = []) {
  return chromium.launch({ ...chromiumLaunchOptions, args: [...chromiumArgs, ...extraArgs] });
}
