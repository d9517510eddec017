import { beforeAll, describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { shot, useSignedInBrowser } from './browser';

const baseUrl = inject('baseUrl');
let page: Page;

const session = useSignedInBrowser('curator@example.org');
beforeAll(() => ({ page } = session));

/** A record as the API answers it, read with the page's own session. */
const apiRecord = (id: number) =>
  page.evaluate(async (recordId) => (await fetch(`/api/records/${recordId}`)).json(), id) as Promise<{
    status: string;
    mergedIntoId: number | null;
    notebookRef: string | null;
    spots: { role: string; rf: number }[];
  }>;

describe('curation in the browser', () => {
  let ids: number[] = [];
  let before: Awaited<ReturnType<typeof apiRecord>>[] = [];

  it('the demo curator finds the seeded duplicates in the curation queue, with reasons and a score', async () => {
    await page.goto(`${baseUrl}/curation`);
    await page.getByRole('heading', { name: /Suspected duplicates \(\d+\)/ }).waitFor();
    const group = page.getByRole('article').filter({ hasText: 'Same conditions recorded more than once' }).first();
    await group.waitFor();
    await expect(group.textContent()).resolves.toMatch(/Target Rf within 0.05/);
    await expect(group.textContent()).resolves.toMatch(/how sure (0\.\d+|1) · (high|medium|low)/);
    await expect(
      page.getByRole('article').filter({ hasText: 'One structure entered as several compounds' }).count(),
    ).resolves.toBeGreaterThan(0);
    await shot(page, 'curation-queue');
    const href = await group.getByRole('link', { name: /Compare and merge/ }).getAttribute('href');
    ids = new URL(href!, baseUrl).searchParams.get('ids')!.split(',').map(Number).slice(0, 2);
    before = await Promise.all(ids.map(apiRecord));
  });

  it('merges a pair choosing the notebook reference from the second record, and the merged record points to the survivor', async () => {
    const [survivor, merged] = ids;
    await page.goto(`${baseUrl}/curation/merge?ids=${survivor},${merged}`);
    await page.getByRole('heading', { name: 'Field by field' }).waitFor();
    await page.getByRole('radio', { name: `notebook reference from record ${merged}` }).check();
    await shot(page, 'curation-merge-screen');
    await page.getByRole('button', { name: `Merge into #${survivor}` }).click();
    await page.getByRole('heading', { name: /Merge #\d+ done/ }).waitFor();

    const [after, gone] = await Promise.all([apiRecord(survivor), apiRecord(merged)]);
    expect(gone).toMatchObject({ status: 'merged', mergedIntoId: survivor });
    // One target on the united record: the merged record's target spot stays on its own page (issue 27).
    const survivorHasTarget = before[0].spots.some((spot) => spot.role === 'target');
    const moved = before[1].spots.filter((spot) => spot.role !== 'target' || !survivorHasTarget).length;
    expect(after.spots.length).toBe(before[0].spots.length + moved);
    expect(after.spots.filter((spot) => spot.role === 'target').length).toBeLessThanOrEqual(1);
    expect(after.notebookRef).toBe(before[1].notebookRef);

    await page.goto(`${baseUrl}/records/${merged}`);
    const pointer = page.getByRole('link', { name: new RegExp(`#${survivor}`) }).first();
    await pointer.waitFor();
    await shot(page, 'curation-merged-record');
  });

  it('unmerges from the history, and both records are back as they were', async () => {
    const [survivor, merged] = ids;
    await page.goto(`${baseUrl}/curation`);
    const row = page
      .getByRole('row', { name: /^Merge \d+$/ })
      .filter({ has: page.getByRole('link', { name: `#${merged}` }) })
      .first();
    await row.getByRole('button', { name: 'Unmerge' }).click();
    await row.getByRole('button', { name: /Confirm unmerge/ }).click();
    await row.getByText(/undone/).waitFor();
    await shot(page, 'curation-unmerged');
    const restored = await Promise.all([apiRecord(survivor), apiRecord(merged)]);
    expect(
      restored.map((record) => [record.status, record.mergedIntoId, record.notebookRef, record.spots.length]),
    ).toEqual(before.map((record) => [record.status, record.mergedIntoId, record.notebookRef, record.spots.length]));
  });
});
