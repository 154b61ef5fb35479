/**
 * The workbench page object and a fixture that fails a test on any console error, page error, failed request or
 * HTTP error status. Tiny cases only (few cells, few particles, short sampling), so the whole e2e run stays short.
 */
import { test as base, expect, type Page, type Download } from '@playwright/test';
import { readFile } from 'node:fs/promises';

export { expect };

/** A small Couette set-up: 20 cells × 20 particles, fixed transient; sampleSteps sets the length of the run. */
export const TINY = { particlesPerCell: '20', transientSteps: '200' } as const;

export class Workbench {
  constructor(readonly page: Page) {}

  async open(): Promise<void> {
    await this.page.goto('/');
    await expect(this.page.getByRole('heading', { level: 1 })).toHaveText('Tenuis — rarefied gas workbench');
    await expect(this.page.locator('#preset-select')).toBeVisible();
  }

  async view(name: '1 Set up and check' | '2 Run' | '3 Results' | RegExp): Promise<void> {
    await this.page.getByRole('tab', { name }).click();
  }

  async pickExample(id: string): Promise<void> {
    await this.page.locator('#example-select').selectOption(id);
    await expect(this.page.getByTestId('plan-review')).toBeVisible();
  }

  param(name: string) {
    return this.page.locator(`#param-${name}`);
  }

  async setParam(name: string, text: string): Promise<void> {
    await this.param(name).fill(text);
  }

  async setParams(values: Readonly<Record<string, string>>): Promise<void> {
    for (const [k, v] of Object.entries(values)) await this.setParam(k, v);
  }

  runButton() {
    return this.page.getByRole('button', { name: 'Run the case' });
  }

  /** The run's state in the header, visible in every view: "run running 40 %", "run finished" … */
  status() {
    return this.page.getByTestId('run-badge');
  }

  async runToEnd(timeout = 60_000): Promise<void> {
    await this.runButton().click();
    await expect(this.status()).toContainText(/finished|stopped/, { timeout });
    await expect(this.page.getByTestId('wall-numbers')).toBeVisible();
  }

  /** Mean and ci95 of a wall number as shown (from the cell's data attributes). */
  async wallNumber(side: string, quantity: string): Promise<{ mean: number; ci95: number; text: string }> {
    const cell = this.page.getByTestId(`wall-${side}-${quantity}`);
    return {
      mean: Number(await cell.getAttribute('data-mean')),
      ci95: Number(await cell.getAttribute('data-ci95')),
      text: (await cell.textContent()) ?? '',
    };
  }

  async download(buttonName: string | RegExp): Promise<{ download: Download; text: string }> {
    const [download] = await Promise.all([
      this.page.waitForEvent('download'),
      this.page.getByRole('button', { name: buttonName }).click(),
    ]);
    const path = await download.path();
    return { download, text: await readFile(path, 'utf8') };
  }

  /** Plots draw when scrolled near the view: scroll to each and wait until it is drawn. */
  async showAllPlots(): Promise<void> {
    for (const id of ['profile-plot', 'field-map', 'wall-plot']) {
      const plot = this.page.getByTestId(id);
      await plot.scrollIntoViewIfNeeded();
      await expect(plot).toHaveAttribute('data-drawn', 'yes');
    }
    await this.page.evaluate(() => window.scrollTo(0, 0));
  }

  async screenshot(name: string): Promise<void> {
    await this.page.screenshot({ path: test.info().outputPath(`${name}.png`), fullPage: true });
    await this.page.screenshot({ path: `test-results/screenshots/${name}.png`, fullPage: true });
  }
}

export const test = base.extend<{ workbench: Workbench; problems: string[] }>({
  problems: async ({ page }, use) => {
    const problems: string[] = [];
    page.on('console', (m) => {
      if (m.type() === 'error') problems.push(`console: ${m.text()} (${m.location().url})`);
    });
    page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
    // Requests the page still had in flight when a test reloaded or navigated it are aborted by that navigation:
    // count the main frame's navigations and remember, for each request, how many had started before it.
    let navigations = 0;
    const startedAfter = new WeakMap<object, number>();
    page.on('request', (r) => {
      if (r.isNavigationRequest() && r.frame() === page.mainFrame()) navigations++;
      startedAfter.set(r, navigations);
    });
    page.on('requestfailed', (r) => {
      // A download's blob URL, an aborted prefetch, and a request a later navigation aborted are not failures of
      // the page.
      const error = r.failure()?.errorText ?? '';
      const leftBehind = error.includes('ERR_ABORTED') && navigations > (startedAfter.get(r) ?? navigations);
      if (!r.url().startsWith('blob:') && !leftBehind) problems.push(`request failed: ${r.url()} ${error}`);
    });
    page.on('response', (r) => {
      if (r.status() >= 400) problems.push(`HTTP ${r.status()}: ${r.url()}`);
    });
    await use(problems);
    expect(problems, 'console errors, page errors or failed requests').toEqual([]);
  },
  workbench: async ({ page, problems }, use) => {
    void problems;
    await use(new Workbench(page));
  },
});
