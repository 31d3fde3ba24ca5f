import { mkdtempSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import { expect } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import type { DraftSurvey } from '@/lib/survey/draft-survey-schema';
import { screenshot } from './browser';

// The inspector's walk through every survey section on a phone, shared by the survey test and the
// cross-role journey: cautions, live results, a photo, a lost signal mid-section, and submission.

/** A small real JPEG, as a phone camera would hand over. */
export async function photoFile() {
  const file = path.join(mkdtempSync(path.join(os.tmpdir(), 'waygrade-photo-')), 'headstock-nameplate.jpg');
  const bytes = await sharp({ create: { width: 1200, height: 900, channels: 3, background: { r: 120, g: 110, b: 96 } } })
    .jpeg({ quality: 80 })
    .toBuffer();
  writeFileSync(file, bytes);
  return file;
}

async function next(page: Page, title: string) {
  await page.getByRole('button', { name: /^Next:/ }).click();
  await page.getByRole('heading', { level: 1, name: title }).waitFor();
}

/** Ticks every item of the safety gate and waits for the power-on inputs to open. */
export async function confirmSafetyGate(page: Page) {
  const gate = page.getByTestId('safety-gate');
  for (const item of ['Guards and covers on', 'Chuck key out', 'Work and chuck secure', 'Emergency stop and brake tested', 'Earth checked']) {
    await gate.getByRole('checkbox', { name: new RegExp(`^${item}`) }).check();
  }
  await page.locator('[data-testid="safety-gate"][data-confirmed="true"]').waitFor();
}

export async function savedSurvey(page: Page, inspectionId: string) {
  const response = await page.request.get(`/api/surveys/${inspectionId}`);
  expect(response.status()).toBe(200);
  return (await response.json()) as { data: { version: number; data: DraftSurvey; status: string; submittedAt: string | null } };
}

export async function waitUntilSaved(page: Page) {
  await page.locator('[data-save-state="saved"]').waitFor({ timeout: 15_000 });
}

/** From the first section to "submitted", on a survey already opened at /jobs/<id>/survey. */
export async function fillEverySectionAndSubmit(page: Page, context: BrowserContext, inspectionId: string, shotPrefix = 'survey') {
  const shot = (name: string) => screenshot(page, name.replace(/^survey/, shotPrefix));
    // 1. Machine and instruments: identity comes from the listing; the instruments are stated here.
    await page.getByRole('heading', { level: 1, name: 'Machine and instruments' }).waitFor();
    expect(await page.getByLabel('Swing over bed').inputValue()).not.toBe('');
    await page.getByRole('button', { name: /^mm\/m/ }).click();
    await page.getByLabel('Level sensitivity per division').fill('0.02');
    await page.getByLabel('Indicator resolution').fill('0.002');
    await page.getByTestId('photo-file-input').setInputFiles(await photoFile());
    await page.getByTestId('section-photos').getByRole('link').first().waitFor({ timeout: 30_000 });
    await waitUntilSaved(page);
    await shot('survey-02-identity');

    // Hidden damage and deal-breakers: nothing found on this machine, so nothing is answered.
    await next(page, 'Hidden damage and deal-breakers');

    // 2. Headstock and lubrication: the isolation and used-oil cautions come before the inputs.
    await next(page, 'Headstock and lubrication');
    await expect(page.getByTestId('safety-cautions').textContent()).resolves.toContain('Isolate before opening covers');
    await page.getByRole('group', { name: 'Oil level', exact: true }).getByRole('button', { name: /^Correct/ }).click();
    await page.getByRole('group', { name: 'Oil colour and sludge' }).getByRole('button', { name: /^1 · darkened/ }).click();
    await page.getByRole('group', { name: 'Oil pump and lines' }).getByRole('button', { name: /^Works/ }).click();
    await page.getByTestId('section-checks').getByText('Headstock oil level').waitFor();
    await shot('survey-03-lubrication');

    // Power run: locked until the safety gate is confirmed; the gate then opens every power-on section.
    await next(page, 'Power run');
    await page.getByTestId('power-on-locked').waitFor();
    await confirmSafetyGate(page);
    await page.getByRole('group', { name: 'Machine at the start' }).getByRole('button', { name: /^Cold/ }).click();
    await page.getByLabel('Minutes run before the readings').fill('20');
    await shot('survey-03b-power-run');

    // 3. Gearbox and feeds
    await next(page, 'Gearbox and feeds');
    await page.getByRole('button', { name: '+ Add a speed range' }).click();
    await page.getByRole('group', { name: 'Noise', exact: true }).getByRole('button', { name: /^1 · even hum/ }).click();
    await page.getByLabel('Sound level at 1 m').fill('74');
    await page.getByRole('group', { name: 'Every feed range engages and drives' }).getByRole('button', { name: /^Works/ }).click();
    await shot('survey-04-gearbox');

    // 4. Drive: the target deflection is worked out from the pulleys.
    await next(page, 'Drive');
    await page.getByLabel('Distance between pulley centres').fill('480');
    await page.getByLabel('Motor pulley diameter').fill('100');
    await page.getByLabel('Driven pulley diameter').fill('180');
    await page.getByText(/target deflection about/).waitFor();
    await page.getByLabel('Measured mid-span deflection').fill('9');
    await shot('survey-05-drive');

    // 5. Bed and ways: the profile redraws as readings are typed; the signal drops mid-section.
    await next(page, 'Bed and ways');
    await page.getByRole('group', { name: 'Load on the stand' }).getByRole('button', { name: /^Normal/ }).click();
    await page.getByLabel('Distance between stations').fill('250');
    const readings = ['1.5', '0.5', '-0.5', '-1'];
    for (const [index, reading] of readings.entries()) {
      if (index > 0) await page.getByRole('button', { name: '+ Add station' }).first().click();
      await page.getByRole('group', { name: 'Along the bed (divisions)' }).getByLabel(`Station ${index + 1}`).fill(reading);
    }
    const plot = page.getByTestId('bed-live-results');
    await plot.locator('svg circle').nth(readings.length).waitFor();
    const straightnessBefore = await plot.locator('dd').first().textContent();
    await waitUntilSaved(page);

    await context.setOffline(true);
    await page.getByRole('button', { name: '+ Add station' }).first().click();
    await page.getByRole('group', { name: 'Along the bed (divisions)' }).getByLabel('Station 5').fill('0.5');
    await plot.locator('svg circle').nth(readings.length + 1).waitFor();
    expect(await plot.locator('dd').first().textContent()).not.toBe(straightnessBefore);
    await page.getByTestId('offline-notice').getByText('Offline — changes kept on this phone').waitFor();
    await page.locator('[data-save-state="offline"]').getByText('Unsaved changes').waitFor();
    await shot('survey-06-bed-offline');
    await context.setOffline(false);
    await waitUntilSaved(page);
    const afterReconnect = await savedSurvey(page, inspectionId);
    expect(afterReconnect.data.data.bedAndWays?.levelling?.longitudinalReadings).toEqual([1.5, 0.5, -0.5, -1, 0.5]);
    await page.getByTestId('section-checks').getByText('Bed straightness, vertical plane').waitFor();
    await shot('survey-06-bed');

    // 6. Spindle: rotating-chuck cautions.
    await next(page, 'Spindle');
    await expect(page.getByTestId('safety-cautions').textContent()).resolves.toContain('chuck key');
    await page.getByLabel('Spindle nose centring diameter').fill('0.006');
    await page.getByLabel('Test bar at the nose').fill('0.008');
    await page.getByTestId('section-checks').locator('[data-band]').first().waitFor();
    await shot('survey-07-spindle');

    // 7. Slides and screws
    await next(page, 'Slides and screws');
    await page.getByRole('region', { name: 'Cross-slide screw' }).getByRole('button', { name: /Indicator on the slide/ }).click();
    await page.getByLabel('Backlash').fill('0.08');
    await shot('survey-08-slides');

    // 8. Tailstock: the correction appears at once.
    await next(page, 'Tailstock');
    await page.getByLabel('Reading near the headstock').fill('0');
    await page.getByLabel('Reading near the tailstock').fill('0.012');
    await page.getByLabel('Carriage travel between the readings').fill('250');
    await expect(page.getByTestId('tailstock-correction').textContent()).resolves.toContain('away from you by 0.012 mm');
    await shot('survey-09-tailstock');

    // 9. Test cuts: the two-collar offset appears at once (25.000 / 25.030 over 300 mm → e = 0.015 mm).
    await next(page, 'Test cuts');
    await page.getByRole('group', { name: 'Work held' }).getByRole('button', { name: /Between centres/ }).click();
    await page.getByLabel('Diameter near the headstock').fill('25.000');
    await page.getByLabel('Diameter near the tailstock').fill('25.030');
    await page.getByLabel('Distance between the collars').fill('300');
    await expect(page.getByTestId('two-collar-result').textContent()).resolves.toContain('0.015 mm');
    await shot('survey-10-test-cuts');

    // 10. Electrical and safety: qualified-person caution; every safety function answered.
    await next(page, 'Electrical and safety');
    await expect(page.getByTestId('safety-cautions').textContent()).resolves.toContain('qualified person');
    for (const group of ['Emergency stop', 'Chuck guard and interlock', 'Spindle brake', 'Guards and covers fitted and closed']) {
      await page.getByRole('group', { name: group, exact: true }).getByRole('button', { name: /^Works/ }).click();
    }
    await page.getByLabel('Protective-earth continuity').fill('0.08');
    await page.getByLabel('Insulation resistance at 500 V DC').fill('150');
    await shot('survey-11-electrical');

    // 11. Accessories
    await next(page, 'Accessories');
    await page.getByRole('button', { name: '+ Add an accessory' }).click();
    await page.getByRole('group', { name: 'Condition', exact: true }).getByRole('button', { name: /^1 · light/ }).click();
    await shot('survey-12-accessories');

    // Check and submit
    await next(page, 'Check and submit');
    await waitUntilSaved(page);
    await page.getByTestId('submission-check').getByText('Ready to submit').waitFor();
    await shot('survey-13-submit');
    await page.getByRole('button', { name: 'Submit survey for review' }).click();
    await page.waitForURL(`**/jobs/${inspectionId}?submitted=1`);
    await page.getByText('Survey submitted — thank you.').waitFor();
    await shot('survey-14-submitted');

}
