import { describe } from "vitest";
import { CHROMIUM_PATH, hasBrowser } from "./app-server";

export * from "./app-server";

const requireBrowser = process.env.REQUIRE_BROWSER === "1";

let warned = false;
/** `describe` for browser journeys: skipped loudly without Chromium, a failure when REQUIRE_BROWSER=1. */
export function describeBrowser(name: string, fn: () => void) {
  if (hasBrowser) return describe(name, fn);
  if (requireBrowser) {
    return describe(name, () => {
      throw new Error(
        `REQUIRE_BROWSER=1 but no Chromium at ${CHROMIUM_PATH}. Install it: sudo apt-get install -y chromium`,
      );
    });
  }
  if (!warned) {
    warned = true;
    console.warn(
      `\n${"!".repeat(78)}\n!! Browser tests SKIPPED: no Chromium at ${CHROMIUM_PATH}.\n` +
        `!! Install it with: sudo apt-get install -y chromium   (or set CHROMIUM_PATH)\n${"!".repeat(78)}\n`,
    );
  }
  return describe.skip(name, fn);
}
