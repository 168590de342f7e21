import { test as base, expect, type Page } from '@playwright/test';

/**
 * Playwright's `test` with every page watched: a console error, an uncaught page error or a 5xx
 * answer fails the test. Chromium also logs each 4xx answer as "Failed to load resource"; those
 * are the API's own refusals (not signed in yet, a tag that does not exist), which the screens
 * turn into words, so they are let through. A test that cuts the network on purpose names the
 * errors that causes with `test.use({ expectedConsoleError: /…/ })`.
 */
export const test = base.extend<{ expectedConsoleError: RegExp | null; consoleGuard: void }>({
  expectedConsoleError: [null, { option: true }],
  consoleGuard: [
    async ({ context, expectedConsoleError }, use) => {
      const problems: string[] = [];
      const expected = [/^Failed to load resource: the server responded with a status of 4\d\d/, ...(expectedConsoleError ? [expectedConsoleError] : [])];
      const watch = (page: Page) => {
        page.on('console', (message) => {
          if (message.type() === 'error' && !expected.some((pattern) => pattern.test(message.text()))) problems.push(`console error on ${page.url()}: ${message.text()}`);
        });
        page.on('pageerror', (error) => problems.push(`page error on ${page.url()}: ${error.message}`));
        page.on('response', (response) => {
          if (response.status() >= 500) problems.push(`${response.status()} from ${response.request().method()} ${response.url()}`);
        });
      };
      context.pages().forEach(watch);
      context.on('page', watch);
      await use();
      expect(problems, 'the browser reported problems').toEqual([]);
    },
    { auto: true },
  ],
});

export { expect };

/** Where tests leave the screenshots people look at. */
export const shotsDir = process.env.E2E_SHOTS_DIR ?? '/tmp/shots';
