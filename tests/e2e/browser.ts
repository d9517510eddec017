import { afterAll, beforeAll, inject } from 'vitest';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { mkdtempSync, mkdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

export const screenshotDir = join(process.cwd(), 'test-results', 'screenshots');
export const DEMO_PASSWORD = process.env.RFOLIO_DEMO_PASSWORD ?? 'rfolio-demo-2026';

/** A phone held at the bench: 390 × 844 CSS px, touch, mobile viewport rules. */
export const PHONE = {
  viewport: { width: 390, height: 844 },
  isMobile: true,
  hasTouch: true,
  deviceScaleFactor: 2,
} as const;

export interface OpenBrowser {
  context: BrowserContext;
  page: Page;
  /** Console errors and uncaught page errors seen so far (every page of the context). */
  consoleErrors: string[];
  /** Lets a journey that provokes an error on purpose (a wrong password answers 401) name it. */
  allowConsoleError: (pattern: RegExp) => void;
  /** Closes the browser, then fails the journey if any console error was not allowed. */
  close: () => Promise<void>;
}

/** Debian's chromium, headless, quiet on a closed network (flags from ../shared/STACK.md). Journeys fail on console errors. */
export async function openBrowser(options: { phone?: boolean } = {}): Promise<OpenBrowser> {
  const profile = mkdtempSync(join(tmpdir(), 'rfolio-e2e-'));
  mkdirSync(screenshotDir, { recursive: true });
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium',
    headless: true,
    ...(options.phone ? PHONE : { viewport: { width: 1280, height: 900 } }),
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
  const consoleErrors: string[] = [];
  const allowed: RegExp[] = [];
  const watch = (page: Page) => {
    page.on('console', (message) => {
      if (message.type() === 'error') consoleErrors.push(`${page.url()}: ${message.text()}`);
    });
    page.on('pageerror', (error) => consoleErrors.push(`${page.url()}: uncaught ${error.message}`));
  };
  context.pages().forEach(watch);
  context.on('page', watch);
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    consoleErrors,
    allowConsoleError: (pattern) => allowed.push(pattern),
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
      const unexpected = consoleErrors.filter((line) => !allowed.some((pattern) => pattern.test(line)));
      if (unexpected.length > 0) throw new Error(`Console errors during the journey:\n${unexpected.join('\n')}`);
    },
  };
}

export async function shot(page: Page, name: string) {
  await page.screenshot({ path: join(screenshotDir, `${name}.png`), fullPage: true });
}

export async function signIn(page: Page, baseUrl: string, email: string, password = DEMO_PASSWORD) {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
}

/**
 * The page's layout at the current viewport: its scroll width, and every visible control smaller than
 * 24 × 24 CSS px (WCAG 2.2 SC 2.5.8 target size, minimum). As the criterion allows, a link inside a sentence
 * (inline among other text) is exempt, and so is a visually hidden control whose visible label is the target
 * (the label is measured instead).
 */
export async function measureLayout(
  page: Page,
): Promise<{ scrollWidth: number; viewportWidth: number; smallTargets: string[]; targets: number }> {
  return page.evaluate(`(() => {
    const hidden = (el) => { const b = el.getBoundingClientRect(); return b.width <= 1 && b.height <= 1; };
    const inSentence = (el) => getComputedStyle(el).display === 'inline' && el.parentElement &&
      Array.from(el.parentElement.childNodes).some((node) => node !== el && node.nodeType === 3 && node.textContent.trim().length > 0);
    const controls = Array.from(
      document.querySelectorAll('a[href], button, input:not([type=hidden]), select, textarea, summary, [role=button], [role=tab]'),
    );
    const small = [];
    let targets = 0;
    for (const control of controls) {
      let el = control;
      const style = getComputedStyle(el);
      if (style.visibility === 'hidden' || style.display === 'none' || el.closest('[aria-hidden=true]')) continue;
      if (hidden(el)) {
        const label = el.id ? document.querySelector('label[for="' + el.id + '"]') : el.closest('label');
        if (!label || hidden(label)) continue;
        el = label;
      }
      const box = el.getBoundingClientRect();
      if (box.width === 0 && box.height === 0) continue;
      targets += 1;
      if (inSentence(el)) continue;
      if (box.width < 23.5 || box.height < 23.5) {
        const name = (el.getAttribute('aria-label') || el.innerText || el.getAttribute('name') || '')
          .trim().replace(/\\s+/g, ' ').slice(0, 40);
        small.push(el.tagName.toLowerCase() + ' "' + name + '" ' + Math.round(box.width) + '×' + Math.round(box.height));
      }
    }
    return { scrollWidth: document.documentElement.scrollWidth, viewportWidth: window.innerWidth, smallTargets: small, targets };
  })()`);
}

/**
 * Opens the browser before a file's journeys, signed in as `email` with the demo password, and closes it after.
 * The returned object holds the browser and its page once the hook has run.
 */
export function useSignedInBrowser(email: string): { browser: OpenBrowser; page: Page } {
  const session = {} as { browser: OpenBrowser; page: Page };
  beforeAll(async () => {
    session.browser = await openBrowser();
    session.page = session.browser.page;
    await signIn(session.page, inject('baseUrl'), email);
  });
  afterAll(() => session.browser?.close());
  return session;
}
