import { test, expect } from './fixtures';
import type { Page } from '@playwright/test';

const AVOGADRO = 6.02214076e23;

// Many small form steps: on a shared two-core machine each can take a second or more, so allow more than the default.
test.describe.configure({ timeout: 60_000 });

async function caseJson(page: Page): Promise<{
  gas: Record<string, unknown> & { custom?: Record<string, unknown> };
  boundaries: Record<string, Record<string, unknown>>;
  blocks: Record<string, unknown>[];
  initial: { pressurePa: number };
}> {
  // The case is derived off the page's thread: read it once the last change is worked out.
  await expect(page.getByTestId('plan-pending')).toHaveCount(0);
  return JSON.parse(await page.getByLabel('case JSON').inputValue());
}

test('wall temperature in °C and a custom gas reach the case; a bad gas field is marked and blocks Run', async ({
  workbench: w,
  page,
}) => {
  await w.open();
  await page.locator('#preset-select').selectOption('cavity');
  await expect(w.runButton()).toBeEnabled();

  // The lid at 50 °C: the case holds 323.15 K; switching the unit shows the same temperature in kelvin.
  await page.getByRole('combobox', { name: 'wall-top-temperature unit' }).selectOption('°C');
  await page.locator('#wall-top-temperature').fill('50');
  await expect.poll(async () => (await caseJson(page)).boundaries.top.temperatureK).toBe(323.15);
  await page.getByRole('combobox', { name: 'wall-top-temperature unit' }).selectOption('K');
  await expect(page.locator('#wall-top-temperature')).toHaveValue('323.15');
  await page.locator('#wall-left-speed').fill('-3');
  await expect.poll(async () => (await caseJson(page)).boundaries.left.velocityMPerS).toEqual([0, -3, 0]);

  // A custom gas, started from the table gas's data: 80 g/mol.
  const tablePressure = (await caseJson(page)).initial.pressurePa;
  await page.getByRole('radio', { name: 'my own data (custom gas)' }).check();
  await expect(page.locator('#gas-mass')).toHaveValue('39.9268'); // argon's 66.3e-27 kg from the table, in g/mol
  await page.locator('#gas-name').fill('heavyGas');
  await page.locator('#gas-mass').fill('80');
  await page.locator('#gas-diameter').fill('0.5');
  await expect.poll(async () => (await caseJson(page)).gas.custom?.name).toBe('heavyGas');
  const custom = (await caseJson(page)).gas.custom!;
  expect(custom.massKg as number).toBeCloseTo(80e-3 / AVOGADRO, 32);
  expect(custom.referenceDiameterM).toBe(5e-10);
  expect((await caseJson(page)).gas.species).toBeUndefined();
  // The Knudsen number is kept: bigger molecules, lower pressure (p ∝ 1/d² for VHS).
  expect((await caseJson(page)).initial.pressurePa).toBeCloseTo(tablePressure * (0.417 / 0.5) ** 2, 3);
  await expect(w.runButton()).toBeEnabled();

  await page.locator('#gas-viscosityIndex').fill('1.4');
  const omegaError = page
    .locator('.field-invalid')
    .filter({ has: page.locator('#gas-viscosityIndex') })
    .locator('.field-error');
  await expect(omegaError).toContainText('between 0.5 (hard sphere) and 1');
  await expect(w.runButton()).toBeDisabled();
  await page.getByTestId('gas-form').scrollIntoViewIfNeeded();
  await w.screenshot('view-setup-gas');
  await page.locator('#gas-viscosityIndex').fill('0.8');
  await expect(w.runButton()).toBeEnabled();
});

test('a block drawn on the domain preview appears in the table and the case; one outside the domain is refused at its row', async ({
  workbench: w,
  page,
}) => {
  await w.open();
  await page.locator('#preset-select').selectOption('channel');
  await expect(w.runButton()).toBeEnabled();
  await expect(page.getByTestId('preview-side-left')).toContainText('left: reservoir');
  await expect(page.getByTestId('preview-side-bottom')).toContainText('bottom: symmetry');
  await expect(page.getByTestId('block-row-0').locator('#block-0-name')).toHaveValue('lowerWall');

  // Drag in the upstream vessel (x < 2 µm of the 9 µm domain, upper part): a third block, snapped to cell edges.
  const area = page.getByTestId('domain-area');
  await page.getByTestId('domain-preview').scrollIntoViewIfNeeded();
  const box = (await area.boundingBox())!;
  await page.mouse.move(box.x + box.width * 0.05, box.y + box.height * 0.1);
  await page.mouse.down();
  await page.mouse.move(box.x + box.width * 0.12, box.y + box.height * 0.25, { steps: 4 });
  await expect(page.getByTestId('preview-drag')).toBeVisible();
  await page.mouse.move(box.x + box.width * 0.18, box.y + box.height * 0.4, { steps: 4 });
  await page.mouse.up();
  await expect(page.locator('#block-2-name')).toHaveValue('block1');
  const xMin = Number(await page.locator('#block-2-xMin').inputValue());
  const xMax = Number(await page.locator('#block-2-xMax').inputValue());
  const yMin = Number(await page.locator('#block-2-yMin').inputValue());
  const yMax = Number(await page.locator('#block-2-yMax').inputValue());
  expect(xMin).toBeGreaterThan(0.2);
  expect(xMax).toBeLessThan(2);
  expect(yMin).toBeGreaterThan(1.5);
  expect(yMax).toBeLessThan(3);
  const drawn = (await caseJson(page)).blocks.find((b) => b.name === 'block1')!;
  expect(drawn.xMinM as number).toBeCloseTo(xMin * 1e-6, 12);
  expect(drawn.yMaxM as number).toBeCloseTo(yMax * 1e-6, 12);
  expect(drawn.wall).toEqual({ type: 'wall', model: 'diffuse', temperatureK: 300 });
  await expect(page.getByTestId('preview-block-2')).toBeVisible();
  await expect(w.runButton()).toBeEnabled();

  // Typed outside the domain: the message is at the block's row, and the run cannot start.
  await page.locator('#block-2-xMax').fill('500');
  await expect(page.getByTestId('block-errors-2')).toContainText('outside the domain');
  await expect(page.getByTestId('block-errors-2')).toContainText(
    'xMaxM (500 µm) lies outside the domain (lengthXM = 9 µm)',
  );
  await expect(w.runButton()).toBeDisabled();
  await page.getByTestId('blocks-form').scrollIntoViewIfNeeded();
  await w.screenshot('view-setup-blocks');

  // Deleting it makes the case valid again; the preset's two blocks stay.
  await page.getByRole('button', { name: 'delete block block1' }).click();
  await expect(w.runButton()).toBeEnabled();
  expect((await caseJson(page)).blocks.map((b) => b.name)).toEqual(['lowerWall', 'upperWall']);

  // A case edited as JSON disables the forms.
  const json = await page.getByLabel('case JSON').inputValue();
  await page.getByLabel('case JSON').fill(json.replace('"name": "channel', '"name": "my channel'));
  await page.getByRole('button', { name: 'Apply JSON edits' }).click();
  await expect(page.locator('#block-0-xMin')).toBeDisabled();
  await expect(page.locator('#gas-model')).toBeDisabled();
});

test('tube given by its vessel pressures in mbar: the case holds them, the Knudsen number and the flow Mach number are shown', async ({
  workbench: w,
  page,
}) => {
  await w.open();
  await page.locator('#preset-select').selectOption('tube');
  await expect(w.runButton()).toBeEnabled();
  await expect(page.getByTestId('gas-state-derived')).toContainText('gives upstream');
  await page.getByRole('radio', { name: 'Upstream and downstream pressures' }).check();
  await expect(w.param('knudsen')).toHaveCount(0);
  await page.getByRole('combobox', { name: 'upstreamPressure unit' }).selectOption('mbar');
  await page.getByRole('combobox', { name: 'downstreamPressure unit' }).selectOption('mbar');
  await w.setParam('upstreamPressure', '0.03');
  await w.setParam('downstreamPressure', '0.01');
  await expect.poll(async () => (await caseJson(page)).boundaries.left.pressurePa).toBe(3);
  expect((await caseJson(page)).boundaries.right.pressurePa).toBe(1);
  await expect(page.getByTestId('gas-state-derived')).toContainText('gives Kn = 3.576 at the mean pressure 0.02 mbar');
  // Labels in words, the case-file name beside.
  await expect(page.locator('label[for="param-upstreamPressure"]')).toContainText('Upstream pressureupstreamPressure');
  await expect(page.locator('label[for="param-lengthToRadius"]')).toContainText('Tube length / radius');
  // The check panel's Mach number is the flow's (free-molecular estimate at Kn 3.6), not 0.
  await expect(page.getByTestId('plan-review').getByLabel('reference state')).toContainText('free-molecular');
});
