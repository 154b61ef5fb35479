import { test, expect } from './fixtures';

test('a negative length, an accommodation of 1.5 and malformed case files each show their message and start nothing', async ({
  workbench: w,
  page,
}) => {
  await w.open();
  await w.pickExample('mems-damping-gap');
  await expect(w.runButton()).toBeEnabled();

  // Negative gap: marked at the field with what is allowed; Run disabled.
  await w.setParam('gap', '-2');
  const gapError = page
    .locator('.field-invalid')
    .filter({ has: page.locator('#param-gap') })
    .locator('.field-error');
  await expect(gapError).toContainText('must be greater than');
  await expect(w.runButton()).toBeDisabled();
  await expect(page.getByTestId('run-disabled-reason')).toContainText('fix the');
  await w.screenshot('view-setup-invalid');
  await w.setParam('gap', '2');
  await expect(w.runButton()).toBeEnabled();

  // Accommodation 1.5 on a Maxwell wall.
  await page.locator('#wall-top-model').selectOption('maxwell');
  await page.locator('#wall-top-accommodation').fill('1.5');
  const accError = page
    .locator('.field-invalid')
    .filter({ has: page.locator('#wall-top-accommodation') })
    .locator('.field-error');
  await expect(accError).toContainText('between 0 and 1');
  await expect(w.runButton()).toBeDisabled();
  await page.locator('#wall-top-accommodation').fill('0.8');
  await expect(w.runButton()).toBeEnabled();

  // A case file that is not JSON: refused with a message; the case is unchanged.
  const before = await page.getByLabel('case JSON').inputValue();
  await page.getByTestId('open-case-file').setInputFiles({
    name: 'broken.json',
    mimeType: 'application/json',
    buffer: Buffer.from('{"schemaVersion": 1, "name": '),
  });
  await expect(page.getByTestId('file-message')).toContainText('broken.json was not opened');
  await expect(page.getByTestId('file-message')).toContainText('not valid JSON');
  await expect(page.getByLabel('case JSON')).toHaveValue(before);

  // A JSON file that is not a valid case, dropped on the page: the message names the field.
  const bad = JSON.parse(before);
  bad.domain.lengthYM = -1e-6;
  const drop = await page.evaluateHandle((text) => {
    const dt = new DataTransfer();
    dt.items.add(new File([text], 'negative-gap.json', { type: 'application/json' }));
    return dt;
  }, JSON.stringify(bad));
  await page.dispatchEvent('main', 'dragover', { dataTransfer: drop });
  await page.dispatchEvent('main', 'drop', { dataTransfer: drop });
  await expect(page.getByTestId('file-message')).toContainText('negative-gap.json was not opened');
  await expect(page.getByTestId('file-message')).toContainText('domain.lengthYM');
  await expect(page.getByLabel('case JSON')).toHaveValue(before);

  // Nothing was started at any point.
  await expect(page.getByTestId('run-badge')).toHaveCount(0);
});

for (const example of ['roughing-line-stub']) {
  test(`${example}: a preset accommodation of 1.5 says one thing, between 0 and 1, with no contradicting hint`, async ({
    workbench: w,
    page,
  }) => {
    await w.open();
    await w.pickExample(example);
    await w.setParam('accommodation', '1.5');
    const message = page.getByRole('alert').filter({ hasText: 'accommodation' }).first();
    await expect(message).toContainText('between 0 and 1');
    await expect(message).not.toContainText('allowed:');
    await expect(w.runButton()).toBeDisabled();
    await w.setParam('accommodation', '1');
    await expect(w.runButton()).toBeEnabled();
  });
}
