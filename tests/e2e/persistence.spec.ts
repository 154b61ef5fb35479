import { test, expect, TINY } from './fixtures';

test('finished runs are kept in IndexedDB: reload, reopen with the same numbers, rename, overlay, delete', async ({
  workbench: w,
  page,
}) => {
  test.setTimeout(120_000);
  page.on('dialog', (d) => void d.accept());
  await w.open();
  await w.pickExample('mems-damping-gap');
  await w.setParams({ ...TINY, knudsen: '0.6', sampleSteps: '4000' });
  await w.runToEnd();
  const first = await w.wallNumber('top', 'shearStress');
  const firstHeat = await w.wallNumber('bottom', 'heatFlux');
  await expect(page.getByRole('tab', { name: 'Saved runs (1)' })).toBeVisible();

  // Reload: the set-up and the saved run are still there.
  await page.reload();
  await expect(page.locator('#param-knudsen')).toHaveValue('0.6');
  await page.getByRole('tab', { name: /Saved runs/ }).click();
  await expect(page.getByTestId('saved-run')).toHaveCount(1);
  await page.getByTestId('saved-run').getByRole('button', { name: 'Open' }).click();
  const reopened = await w.wallNumber('top', 'shearStress');
  expect(reopened.mean).toBe(first.mean);
  expect(reopened.ci95).toBe(first.ci95);
  expect((await w.wallNumber('bottom', 'heatFlux')).mean).toBe(firstHeat.mean);

  // Rename, and the name survives a reload.
  await page.getByRole('tab', { name: /Saved runs/ }).click();
  await page.getByTestId('saved-run').getByRole('button', { name: 'Rename' }).click();
  await page.getByLabel('new name').fill('damping gap, Kn 0.6');
  await page.getByRole('button', { name: 'Keep name' }).click();
  await expect(page.getByTestId('saved-run')).toContainText('damping gap, Kn 0.6');
  await page.reload();
  await page.getByRole('tab', { name: /Saved runs/ }).click();
  await expect(page.getByTestId('saved-run')).toContainText('damping gap, Kn 0.6');

  // A second run, overlaid with the first on the profile plot.
  await page.getByRole('tab', { name: '1 Set up and check' }).click();
  await w.setParam('knudsen', '1.2');
  await w.runToEnd();
  await page.locator('#compare-select').selectOption({ label: 'damping gap, Kn 0.6' });
  await page.getByTestId('profile-plot').scrollIntoViewIfNeeded();
  await expect(page.getByTestId('profile-plot')).toHaveAttribute('data-drawn', 'yes');
  await expect(page.getByTestId('profile-plot').locator('.legendtext')).toContainText([
    'this run',
    'saved: damping gap, Kn 0.6',
  ]);
  await page.getByRole('tab', { name: /Saved runs/ }).click();
  await expect(page.getByTestId('saved-run')).toHaveCount(2);
  await w.screenshot('view-saved-runs');
  await page
    .getByTestId('saved-run')
    .filter({ hasText: 'damping gap, Kn 0.6' })
    .getByRole('button', { name: 'Delete' })
    .click();
  await expect(page.getByTestId('saved-run')).toHaveCount(1);
  await page.reload();
  await page.getByRole('tab', { name: /Saved runs/ }).click();
  await expect(page.getByTestId('saved-run')).toHaveCount(1);
});
