import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signIn, startE2e, type E2e } from './support/e2e-app';

let e2e: E2e;

beforeAll(async () => {
  e2e = await startE2e();
});
afterAll(() => e2e?.close());

describe('navigation in the browser', () => {
  it('when a link is followed from a page with a table then the next screen replaces it', async () => {
    const page = await e2e.newPage();
    await signIn(page, e2e.origin, 'planner@demo.test');
    for (const from of ['/contracts', '/yards', '/sites', '/growers']) {
      await page.goto(`${e2e.origin}${from}`);
      await page.getByRole('table').first().waitFor();
      await page
        .getByRole('navigation', { name: 'Main' })
        .first()
        .getByRole('link', { name: 'Season' })
        .click();
      await page.waitForURL(/\/season/);
      await expect
        .poll(() => page.locator('main h1').first().innerText(), { timeout: 10_000 })
        .toMatch(/season/i);
    }
  });
});
