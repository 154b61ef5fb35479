import { test, expect, TINY } from './fixtures';
import type { Page } from '@playwright/test';

/** The shapes plotly drew over the field map (its graph div keeps the layout it was given). */
async function fieldMapShapes(page: Page): Promise<{ type: string; x0: number; x1: number; y0: number; y1: number }[]> {
  return page
    .getByTestId('field-map')
    .locator('.plot-area')
    .evaluate((div) => ((div as unknown as { layout?: { shapes?: unknown[] } }).layout?.shapes ?? []) as never);
}

async function shownValues(page: Page): Promise<string[]> {
  return page
    .getByTestId('profile-values')
    .locator('tbody td[data-mean]')
    .evaluateAll((tds) => tds.map((td) => td.getAttribute('data-mean') ?? ''));
}

test('a slit with thick plates: the field map draws both plates, a horizontal cut through a plate shows gaps and exports as CSV', async ({
  workbench: w,
  page,
}) => {
  test.setTimeout(90_000);
  await w.open();
  await w.pickExample('gas-feed-slit');
  // 20 µm slit in an 80 µm high domain; plates 20 µm thick (x 60–80 µm), cells 10 µm: the plate fills whole cells.
  await w.setParams({
    thicknessToGap: '1',
    cellsY: '8',
    particlesPerCell: '10',
    transientSteps: '200',
    sampleSteps: '2000',
  });
  await w.runToEnd();
  await w.view('3 Results');

  const map = page.getByTestId('field-map');
  await map.scrollIntoViewIfNeeded();
  await expect(map).toHaveAttribute('data-drawn', 'yes');
  await expect(page.getByTestId('field-map-geometry')).toHaveAttribute('data-block-shapes', '2');
  const rects = (await fieldMapShapes(page)).filter((s) => s.type === 'rect');
  expect(rects).toHaveLength(2);
  // Lower plate from the bottom to the slit, upper plate from the slit to the top, both at x 60–80 µm.
  expect(rects.map((r) => [r.x0, r.x1, r.y0, r.y1].map((v) => Math.round(v)))).toEqual([
    [60, 80, 0, 30],
    [60, 80, 50, 80],
  ]);
  expect(await map.locator('.shapelayer path').count()).toBeGreaterThanOrEqual(2);
  await expect(map.locator('.annotation-text')).toContainText(['lowerPlate', 'upperPlate']);
  await page.locator('#field-quantity').selectOption('machNumber');
  await expect(page.locator('#field-quantity')).toHaveValue('machNumber');
  await w.screenshot('view-results-fieldmap');

  // The default cut: across the middle of the slit (the column at mid-length of the plates), one point per row.
  const panel = page.getByTestId('profile-panel');
  await panel.scrollIntoViewIfNeeded();
  await page.getByText(/^Profile values/).click();
  await expect(page.getByTestId('profile-values').locator('tbody tr')).toHaveCount(8);
  const averaged = await shownValues(page);

  // A horizontal cut at y = 2 µm snaps to the first row's centre (5 µm) and runs along x through the lower plate.
  await page.locator('#profile-cut').selectOption('horizontal');
  await expect(panel).toHaveAttribute('data-cut', 'horizontal');
  await page.locator('#profile-cut-position').fill('2');
  await expect(page.getByTestId('cut-position')).toContainText('y = 5 µm: centre of row 1 of 8');
  await expect(page.locator('#profile-title')).toHaveText('Profile along x at y = 5 µm (one row of cells)');
  const rows = page.getByTestId('profile-values').locator('tbody tr');
  await expect(rows).toHaveCount(14);
  await expect(page.getByTestId('profile-values').locator('thead')).toContainText('x [µm]');
  const along = await shownValues(page);
  expect(along).not.toEqual(averaged);
  // The two cells inside the plate are gaps, not zeros, in the table and in the plot.
  await expect(page.getByTestId('profile-values').getByText('— (inside a block)')).toHaveCount(2);
  await expect(page.getByTestId('cut-gaps')).toContainText('2 of 14 points');
  await expect(page.getByTestId('profile-plot')).toHaveAttribute('data-drawn', 'yes');
  await expect(page.getByTestId('profile-plot').locator('.xtitle')).toHaveText('x [µm]');

  const { download, text } = await w.download('This cut (CSV)');
  expect(download.suggestedFilename()).toMatch(/-cut-horizontal-5um\.csv$/);
  const lines = text.trimEnd().split('\n');
  const header = lines[0].split(',');
  expect(header.slice(0, 2)).toEqual(['x [m]', 'y [m]']);
  const vx = header.indexOf('velocityX [m/s]');
  expect(header[vx + 1]).toBe('velocityX ci95 [m/s]');
  expect(header).toContain('machNumber [1]');
  for (const h of header) expect(h).toMatch(/\[[^\]]+\]$/);
  expect(lines).toHaveLength(1 + 14);
  expect(lines.slice(1).filter((l) => l.split(',')[vx] === '')).toHaveLength(2);
  expect(Number(lines[1].split(',')[1])).toBeCloseTo(5e-6, 12);
});

test('a Couette gap: continuum predictions are toggled one by one on the row average and a vertical cut, and left off horizontal cuts', async ({
  workbench: w,
  page,
}) => {
  test.setTimeout(90_000);
  await w.open();
  await w.pickExample('mems-damping-gap');
  await w.setParams({ knudsen: '0.8', ...TINY, sampleSteps: '6000' });
  await w.runToEnd();
  await w.view('3 Results');

  const plot = page.getByTestId('profile-plot');
  await plot.scrollIntoViewIfNeeded();
  await expect(plot).toHaveAttribute('data-drawn', 'yes');
  const toggles = page.getByTestId('continuum-toggles');
  await expect(toggles.getByRole('checkbox')).toHaveCount(4);
  await expect(plot.locator('.legendtext')).toHaveText([
    'this run',
    'no-slip',
    'first-order slip',
    'second-order slip',
    'free-molecular limit',
  ]);
  await page.getByText(/^Profile values/).click();
  await expect(page.getByTestId('profile-values').locator('thead')).toContainText('no-slip [m/s]');

  await toggles.getByLabel('no-slip').uncheck();
  await expect(plot.locator('.legendtext')).toHaveText([
    'this run',
    'first-order slip',
    'second-order slip',
    'free-molecular limit',
  ]);
  await expect(page.getByTestId('profile-values').locator('thead')).not.toContainText('no-slip');

  // A vertical cut (one column): the same overlays, the same choice.
  await page.locator('#profile-cut').selectOption('vertical');
  await expect(page.locator('#profile-title')).toContainText('Profile across y at x =');
  await expect(page.getByTestId('profile-values').locator('tbody tr')).toHaveCount(20);
  await expect(plot.locator('.legendtext')).toHaveText([
    'this run',
    'first-order slip',
    'second-order slip',
    'free-molecular limit',
  ]);
  await w.screenshot('view-results-cut');
  await toggles.getByLabel('no-slip').check();
  await expect(plot.locator('.legendtext')).toHaveText([
    'this run',
    'no-slip',
    'first-order slip',
    'second-order slip',
    'free-molecular limit',
  ]);
  const { text } = await w.download('This cut (CSV)');
  const header = text.split('\n')[0].split(',');
  expect(header.slice(0, 2)).toEqual(['y [m]', 'x [m]']);
  const vx = header.indexOf('velocityX [m/s]');
  expect(header.slice(vx, vx + 6)).toEqual([
    'velocityX [m/s]',
    'velocityX ci95 [m/s]',
    'velocityX no-slip [m/s]',
    'velocityX first-order slip [m/s]',
    'velocityX second-order slip [m/s]',
    'velocityX free-molecular limit [m/s]',
  ]);

  // Along x the across-gap predictions do not apply.
  await page.locator('#profile-cut').selectOption('horizontal');
  await expect(page.getByTestId('continuum-toggles')).toHaveCount(0);
  await expect(plot.locator('.scatterlayer .trace')).toHaveCount(1);
  await expect(page.getByText('they are drawn on vertical cuts and the average over x')).toBeVisible();

  // Wall distributions: one wall chosen, pressure on it with its unit.
  await page.locator('#wall-quantity').selectOption('normalStress');
  await page.locator('#wall-choice').selectOption('top');
  const walls = page.getByTestId('wall-plot');
  await walls.scrollIntoViewIfNeeded();
  await expect(walls).toHaveAttribute('data-drawn', 'yes');
  await expect(walls.locator('.ytitle')).toHaveText('normalStress [Pa]');
  await expect(walls.locator('.xtitle')).toHaveText('x along the wall [µm]');
  await expect(walls.locator('.legendtext')).toHaveText(['top (along x)']);
});

test('a lid-driven cavity: its Navier–Stokes centreline predictions appear on the vertical cut through the centre, not on the row average', async ({
  workbench: w,
  page,
}) => {
  test.setTimeout(90_000);
  await w.open();
  await w.pickExample('trench-under-moving-lid');
  await w.setParams({ cells: '10', particlesPerCell: '10', transientSteps: '300', sampleSteps: '1500' });
  await w.runToEnd();
  await w.view('3 Results');

  const plot = page.getByTestId('profile-plot');
  await plot.scrollIntoViewIfNeeded();
  await expect(plot).toHaveAttribute('data-drawn', 'yes');
  // The average over x is no centreline: no overlay, and the hint says where the predictions hold.
  await expect(plot.locator('.scatterlayer .trace')).toHaveCount(1);
  await expect(page.getByText(/hold along particular lines \(here: x = 250 µm, y = 250 µm\)/)).toBeVisible();

  // Column 6 of 10 has its centre at 275 µm, within half a cell (25 µm) of the vertical centreline x = 250 µm.
  await page.locator('#profile-cut').selectOption('vertical');
  await expect(page.getByTestId('cut-position')).toContainText('centre of column 6 of 10');
  await expect(page.getByTestId('continuum-toggles').getByRole('checkbox')).not.toHaveCount(0);
  const legend = await plot.locator('.legendtext').allTextContents();
  expect(legend[0]).toBe('this run');
  expect(legend).toContain('no-slip');
  // A column away from the centreline has none.
  await page.locator('#profile-cut-position').fill('30');
  await expect(page.getByTestId('cut-position')).toContainText('centre of column 1 of 10');
  await expect(plot.locator('.scatterlayer .trace')).toHaveCount(1);
});
