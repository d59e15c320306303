import { existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { inflateSync } from "node:zlib";
import { chromium, type BrowserContext, type Page } from "playwright-core";
import { REPO_ROOT } from "./server";

/** Debian's Chromium, installed by `.ci/run`. */
export const CHROMIUM_PATH = "/usr/bin/chromium";
export const chromiumMissing = !existsSync(CHROMIUM_PATH);
export const ARTIFACTS_DIR = join(REPO_ROOT, "tests/artifacts");

const CHROMIUM_ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export type Browser = { context: BrowserContext; page: Page; close: () => Promise<void> };

/** Chromium with a fresh profile directory (`--user-data-dir`, passed by playwright for a persistent context). */
export async function openBrowser(): Promise<Browser> {
  const profile = mkdtempSync(join(tmpdir(), "hydrastate-chromium-"));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: CHROMIUM_ARGS,
    acceptDownloads: true,
    viewport: { width: 1280, height: 900 },
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(ARTIFACTS_DIR, { recursive: true });
  await page.screenshot({ path: join(ARTIFACTS_DIR, `${name}.png`), fullPage: true });
}

export type AxeViolation = { id: string; impact: string | null; help: string; nodes: { target: string[] }[] };

/** Runs axe-core (injected from node_modules) on the page; returns the serious and critical violations. */
export async function seriousAxeViolations(page: Page): Promise<AxeViolation[]> {
  const source = readFileSync(join(REPO_ROOT, "node_modules/axe-core/axe.min.js"), "utf8");
  await page.addScriptTag({ content: source });
  const violations = (await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (ctx: unknown, opts: unknown) => Promise<{ violations: unknown[] }> } }).axe;
    const result = await axe.run(document, { resultTypes: ["violations"] });
    return result.violations;
  })) as AxeViolation[];
  return violations.filter((v) => v.impact === "serious" || v.impact === "critical");
}

/**
 * Whether a PDF contains a text: in the raw bytes (document information, uncompressed strings), or in any
 * Flate-compressed stream, as plain text or as the hex string a standard-font text operator writes.
 */
export function pdfContainsText(pdf: Buffer, text: string): boolean {
  const raw = pdf.toString("latin1");
  if (raw.includes(text)) return true;
  const hex = Buffer.from(text, "latin1").toString("hex");
  const streamPattern = /stream\r?\n/g;
  let match: RegExpExecArray | null;
  while ((match = streamPattern.exec(raw)) !== null) {
    const start = match.index + match[0].length;
    const end = raw.indexOf("endstream", start);
    if (end < 0) break;
    try {
      const inflated = inflateSync(pdf.subarray(start, end)).toString("latin1");
      if (inflated.includes(text) || inflated.toLowerCase().includes(hex)) return true;
      // Kerned text is written as [<hex> kern <hex> …] TJ: join the hex strings of the stream before looking.
      const joined = (inflated.match(/<([0-9a-fA-F\s]*)>/g) ?? []).map((h) => h.slice(1, -1).replace(/\s+/g, "")).join("").toLowerCase();
      if (joined.includes(hex)) return true;
    } catch {
      // not a Flate stream
    }
  }
  return false;
}
