import { expect, test } from '@playwright/test';

test('piston drop: stroke 54, rod 105, 90° answers 30.531 mm as you type (Heywood eq. 2.5)', async ({ page }) => {
  await page.goto('/calculators/piston-drop');
  await expect(page.getByRole('heading', { level: 1, name: /Piston drop/ })).toBeVisible();
  await page.getByLabel('Stroke').fill('54');
  await page.getByLabel('Con-rod length').fill('105');
  await page.getByLabel('Crank angle from TDC').fill('90');
  // Heywood eq. 2.5, a = 27, θ = 90°: drop = 132 − √(105² − 27²) = 30.5308 mm (worked by hand).
  await expect(page.getByTestId('drop-value')).toHaveText('30.531 mm');
  await expect(page.getByRole('img', { name: /Crank at 90\.0° from TDC/ })).toBeVisible();

  // The same length in inches: 30.5308 / 25.4 = 1.2020 in (1 in = 25.4 mm exactly).
  await page.locator('label').filter({ hasText: /^inch$/ }).click();
  await expect(page.getByRole('radio', { name: 'inch', exact: true })).toBeChecked();
  await expect(page.getByTestId('drop-value')).toHaveText('1.2020 in');
  await expect(page.getByLabel('Stroke')).toHaveValue('2.126');

  // A rod shorter than the crank throw answers its own message, naming the field and range.
  await page.locator('label').filter({ hasText: /^mm$/ }).click();
  await expect(page.getByRole('radio', { name: 'mm', exact: true })).toBeChecked();
  await page.getByLabel('Con-rod length').fill('20');
  await expect(page.getByText(/Con-rod length must be longer than the crank throw/)).toBeVisible();
  await expect(page.getByTestId('drop-value')).toHaveCount(0);
});

test('piston drop back to angle, and the advance mark link into the sheet maker', async ({ page }) => {
  await page.goto('/calculators/piston-drop');
  await page.getByLabel(/I know the drop/).check();
  await page.getByLabel('Piston drop below TDC').fill('1.8');
  // Law of cosines from Heywood eq. 2.5, s = 132 − 1.8 = 130.2:
  // cos θ = (130.2² + 27² − 105²) / (2 · 27 · 130.2) = 6656.04 / 7030.8 = 0.946697…, θ = 18.79°.
  await expect(page.getByTestId('angle-value')).toHaveText('18.79°');
  const link = page.getByRole('link', { name: /Mark 18\.8° BTDC on a wheel/ });
  await expect(link).toHaveAttribute('href', '/?keep=1&addAdvanceMarkDeg=18.8');

  // Half-stroke drop: cos θ = a / 2l = 27/210, θ = 82.61°: beyond the sheet's 0–60° BTDC, so no mark link.
  await page.getByLabel('Piston drop below TDC').fill('27');
  await expect(page.getByTestId('angle-value')).toHaveText('82.61°');
  await expect(page.getByRole('link', { name: /on a wheel/ })).toHaveCount(0);
});

test('piston drop: a wrist-pin offset changes the answer and is drawn', async ({ page }) => {
  await page.goto('/calculators/piston-drop');
  // Centred pin, Heywood eq. 2.5: 30.531 mm (as above). Typed again until the form has hydrated and answers.
  await expect(async () => {
    await page.getByLabel('Crank angle from TDC').fill('90');
    await expect(page.getByTestId('drop-value')).toHaveText('30.531 mm', { timeout: 1000 });
  }).toPass();
  await expect(page.getByTestId('pin-offset')).toHaveCount(0);
  await page.getByLabel('Wrist-pin offset').fill('1.5');
  // Offset slider-crank (Norton, Design of Machinery; from memory), a = 27, l = 105, e = 1.5, worked with bc:
  // φ_TDC = asin(1.5/132) = 0.65110°, y_TDC = √(132² − 1.5²) = 131.99148, φ = 90.65110°,
  // y = 27·cos φ + √(105² − (27·sin φ − 1.5)²) = −0.30682 + 101.85695 = 101.55013, drop = 30.441 mm.
  await expect(page.getByTestId('drop-value')).toHaveText('30.441 mm');
  await expect(page.getByTestId('pin-offset')).toHaveCount(1);
  await expect(page.getByRole('img', { name: /wrist pin offset 1\.500 mm/ })).toBeVisible();
  // Beyond the ±5 mm practical range: the field's own message with the allowed range.
  await page.getByLabel('Wrist-pin offset').fill('6');
  await expect(page.getByText(/Wrist-pin offset must be at most 5 mm \(allowed -5 to 5 mm\)/)).toBeVisible();
  await expect(page.getByTestId('drop-value')).toHaveCount(0);
});

test('TDC from stops across the 0/360 seam on a full wheel', async ({ page }) => {
  await page.goto('/calculators/tdc');
  await page.getByLabel(/^Full/).check();
  await page.getByLabel('Reading A (first stop)').fill('340');
  await page.getByLabel('Reading B (other stop)').fill('30');
  // Midway on the 50° short arc 340 → 30 is 5° (common practice: TDC midway between the stops).
  await expect(page.getByTestId('tdc-reading')).toHaveText('5.0°');
  await expect(page.getByTestId('tdc-correction')).toHaveText('−5.0°');
  await expect(page.getByTestId('tdc-stop-angle')).toHaveText('25.0° either side');
  await expect(page.getByRole('link', { name: /note/ })).toHaveAttribute('href', /tdcCrankDeg=5&tdcStopDeg=25/);

  // A fresh browser's sheet is split (0–180): the note speaks that numbering, not the full wheel's 5°.
  await page.getByRole('link', { name: /note/ }).click();
  await expect(page.getByLabel('Note (optional)')).toHaveValue(
    'True TDC reads 5° ATDC on this wheel (stop 25° either side): move the pointer 5° toward the BTDC side',
  );
});

test('port events: durations, blowdown and the ring', async ({ page }) => {
  await page.goto('/calculators/port-events');
  await page.getByLabel('Deck height').fill('0');
  await page.getByLabel('Port 1 edge height').fill('27');
  await page.getByLabel('Port 2 edge height').fill('40');
  await page.getByLabel('Port 3 edge height').fill('40');
  // Exhaust at half stroke opens at 82.61° ATDC: duration 360 − 2 × 82.61 = 194.8° (common practice).
  await expect(page.getByTestId('duration-0')).toHaveText('194.8°');
  // Transfer at 40 mm opens at 111.64°; blowdown 111.64 − 82.61 = 29.0°.
  await expect(page.getByTestId('blowdown')).toHaveText('29.0°');
  await expect(page.getByRole('img', { name: /Port timing ring: Exhaust open 82\.6° to 277\.4°/ })).toBeVisible();
  await expect(page.getByRole('link', { name: /Use on a wheel/ })).toHaveAttribute('href', /keep=1&numbering=full&portEvents=/);

  // The link opens the sheet maker with the port events filled in, nothing dropped.
  await page.getByRole('link', { name: /Use on a wheel/ }).click();
  // The sheet maker writes its whole form into the URL, so other settings may sit between these.
  await expect(page).toHaveURL(/\/\?kind=wheel&.*carrier=rotating&numbering=full&portEvents=/);
  await expect(page.getByLabel('Port 1 name')).toHaveValue('Exhaust');
  await expect(page.getByLabel('Port 1 opening angle')).toHaveValue('82.6');
  await expect(page.getByLabel('Port 1 closing angle')).toHaveValue('277.4');
  await expect(page.getByText('Some values in the link were not used')).toHaveCount(0);
});

test('divider distances by keyboard alone, and the scribe chart link', async ({ page }) => {
  await page.goto('/calculators/arc-chord');
  await page.getByLabel('Diameter where you mark').focus();
  await page.keyboard.press('ControlOrMeta+a');
  await page.keyboard.type('100');
  await page.keyboard.press('Tab');
  await expect(page.getByLabel('Angles from TDC')).toBeFocused();
  await page.keyboard.press('ControlOrMeta+a');
  await page.keyboard.type('18, 60');
  // Arc = π·D·θ/360 = 5π = 15.71 mm; chord = D·sin(θ/2) = 100 × sin 9° = 15.64 mm; at 60° the chord is the radius, 50.00.
  await expect(page.getByTestId('arc-0')).toHaveText('15.71');
  await expect(page.getByTestId('chord-0')).toHaveText('15.64');
  await expect(page.getByTestId('chord-1')).toHaveText('50.00');
  await expect(page.getByRole('link', { name: /scribe chart/ })).toHaveAttribute('href', '/?keep=1&kind=scribe&diameterMm=100&fromDeg=18&toDeg=60');
  // A bad entry answers its own message.
  await page.getByLabel('Angles from TDC').fill('18, 400');
  await expect(page.getByText('Angle must be at most 360° (allowed 0–360°)')).toBeVisible();
});
