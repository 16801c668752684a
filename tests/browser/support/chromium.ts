import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

export const SCREENSHOT_DIR = 'tests/browser/screenshots';

/** Debian's Chromium, headless, with a throw-away profile and no calls home. */
export async function launchChromium(): Promise<{ context: BrowserContext; close: () => Promise<void> }> {
  const profileDir = mkdtempSync(join(tmpdir(), 'dt-'));
  const context = await chromium.launchPersistentContext(profileDir, {
    executablePath: '/usr/bin/chromium',
    headless: true,
    viewport: { width: 1280, height: 800 },
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  return {
    context,
    close: async () => {
      await context.close();
      rmSync(profileDir, { recursive: true, force: true });
    },
  };
}

/** Saves a 1280×800 screenshot of the page under tests/browser/screenshots/. */
export async function screenshot(page: Page, name: string): Promise<void> {
  await page.screenshot({ path: join(SCREENSHOT_DIR, `${name}.png`) });
}

/** Collects page errors, console errors, failed requests (other than 401) and off-host requests, for one assertion at the end. */
export function watchForPageProblems(page: Page): string[] {
  const problems: string[] = [];
  page.on('pageerror', (error) => problems.push(`page error: ${error.message}`));
  page.on('console', (message) => {
    // Failed loads are judged by status below; any other console error (a CSP refusal, a React warning) counts.
    if (message.type() === 'error' && !message.text().startsWith('Failed to load resource'))
      problems.push(`console: ${message.text()}`);
  });
  page.on('response', (response) => {
    // 401 is the expected answer to "who is signed in?" on signed-out pages and to a wrong password.
    if (response.status() >= 400 && response.status() !== 401)
      problems.push(`${response.status()} from ${response.url()}`);
  });
  page.on('request', (request) => {
    const url = new URL(request.url());
    if (url.hostname !== '127.0.0.1') problems.push(`external request: ${request.url()}`);
  });
  return problems;
}

/** A new tab with no session, so one failed test cannot leave the next signed in; its problems are watched. */
export async function openCleanPage(context: BrowserContext): Promise<{ page: Page; problems: string[] }> {
  await context.clearCookies();
  const page = await context.newPage();
  return { page, problems: watchForPageProblems(page) };
}
