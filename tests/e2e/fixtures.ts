import { test as base, expect } from '@playwright/test';

// A 4xx the page expects and explains (a refused booking, the signed-out probe before sign-in)
// shows in the console as a failed resource; anything else logged as an error fails the test.
const explainedRefusal = /^Failed to load resource: the server responded with a status of 4\d\d/;

/**
 * Every test here fails on a page error, a console error or a 5xx answer, whatever it was
 * checking: a screen that works but throws on the way is broken for the person using it.
 */
export const test = base.extend<{ consoleGuard: void }>({
  consoleGuard: [
    async ({ page }, use) => {
      const problems: string[] = [];
      page.on('pageerror', (error) => problems.push(`page error: ${error.message}`));
      page.on('console', (message) => {
        if (message.type() === 'error' && !explainedRefusal.test(message.text())) problems.push(`console error: ${message.text()}`);
      });
      page.on('response', (response) => {
        if (response.status() >= 500) problems.push(`${response.status()} from ${response.request().method()} ${response.url()}`);
      });
      await use();
      expect(problems, 'console errors, page errors or server errors while the test ran').toEqual([]);
    },
    { auto: true },
  ],
});

export { expect };
