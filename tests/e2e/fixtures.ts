import { test as base, expect, type Browser, type BrowserContext, type Page } from '@playwright/test';

/**
 * Chromium logs each 4xx answer as "Failed to load resource": those are the API's own refusals
 * (not signed in yet, a booking that clashes, a tag that does not exist), which the screens turn
 * into words, so they are let through. Anything else logged as an error fails the test.
 */
const explainedRefusal = /^Failed to load resource: the server responded with a status of 4\d\d/;

/**
 * Playwright's `test` with every page of every browser context watched: a console error, an
 * uncaught page error or a 5xx answer fails the test, whatever it was checking. A screen that
 * works but throws on the way is broken for the person using it. Contexts a test opens itself
 * (`browser.newContext()`, one per person) are watched too. A test that cuts the network on
 * purpose names the errors that causes with `test.use({ expectedConsoleError: /…/ })`.
 */
export const test = base.extend<{ expectedConsoleError: RegExp | null; consoleGuard: void }>({
  expectedConsoleError: [null, { option: true }],
  consoleGuard: [
    async ({ browser, context, expectedConsoleError }, use) => {
      const problems: string[] = [];
      const expected = [explainedRefusal, ...(expectedConsoleError ? [expectedConsoleError] : [])];
      const watchPage = (page: Page) => {
        page.on('console', (message) => {
          if (message.type() === 'error' && !expected.some((pattern) => pattern.test(message.text()))) problems.push(`console error on ${page.url()}: ${message.text()}`);
        });
        page.on('pageerror', (error) => problems.push(`page error on ${page.url()}: ${error.message}`));
        page.on('response', (response) => {
          if (response.status() >= 500) problems.push(`${response.status()} from ${response.request().method()} ${response.url()}`);
        });
      };
      const watch = (watched: BrowserContext) => {
        watched.pages().forEach(watchPage);
        watched.on('page', watchPage);
      };
      watch(context);
      const restore = watchNewContexts(browser, watch);
      try {
        await use();
      } finally {
        restore();
      }
      expect(problems, 'the browser reported problems').toEqual([]);
    },
    { auto: true },
  ],
});

/** Browser has no event for a new context, so its factory is wrapped for the length of one test. */
function watchNewContexts(browser: Browser, watch: (context: BrowserContext) => void): () => void {
  const newContext = browser.newContext;
  browser.newContext = async (...args: Parameters<Browser['newContext']>) => {
    const created = await newContext.apply(browser, args);
    watch(created);
    return created;
  };
  return () => {
    browser.newContext = newContext;
  };
}

export { expect };

/** Where tests leave the screenshots people look at. */
export const shotsDir = process.env.E2E_SHOTS_DIR ?? '/tmp/shots';
