// Finds and starts Debian's Chromium for the browser tests. playwright-core
// cannot download its own browsers on these machines, so the tests drive the
// system package instead.
import { existsSync } from "node:fs";
import { chromium, type Browser } from "playwright-core";

export const INSTALL_HINT = "apt-get update && apt-get install -y chromium";

/** Flags known to start headless Chromium in containers without a GPU, a sandbox or a network. */
export const CHROMIUM_ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
  "--disable-quic",
];

/** RAILSIEVE_CHROMIUM, when set, is the only place looked at (so a run can also pretend there is none). */
export function findChromium(): string | undefined {
  const override = process.env.RAILSIEVE_CHROMIUM;
  const candidates = override ? [override] : ["/usr/bin/chromium", "/usr/bin/chromium-browser"];
  return candidates.find((path) => existsSync(path));
}

/** Playwright gives each launch its own fresh, empty profile folder and removes it on close. */
export function launchChromium(executablePath: string): Promise<Browser> {
  return chromium.launch({ executablePath, args: CHROMIUM_ARGS, timeout: 60_000 });
}
