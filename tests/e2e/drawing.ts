import type { Locator, Page } from 'playwright-core';
import sharp from 'sharp';

/**
 * Tools of OpenChemLib 9.25's editor toolbar as [column, row]: two columns of 23 px, rows of 21.2 px, read off
 * a screenshot of the toolbar (row 8: cyclopentane, cyclohexane; row 9: cycloheptane, benzene; rows 11–16:
 * element buttons C/Si, N/P, O/S, F/Cl, Br/I, H).
 */
const tools = { cyclohexane: [1, 8], benzene: [1, 9], N: [0, 12], O: [0, 13] } as const;

/** The structure input's two canvases: the toolbar, then the drawing area. */
const canvases = (page: Page): [Locator, Locator] => [page.locator('canvas').first(), page.locator('canvas').nth(1)];

/** Opens the structure input's Draw tab and waits for the lazily loaded editor. */
export async function openDrawTab(page: Page) {
  await page.getByRole('tab', { name: 'Draw' }).click();
  await canvases(page)[1].waitFor();
}

/** Picks a toolbar tool with the mouse. */
export async function chooseTool(page: Page, tool: keyof typeof tools) {
  const box = (await canvases(page)[0].boundingBox())!;
  const [column, row] = tools[tool];
  await page.mouse.click(box.x + column * 23 + 11.5, box.y + row * 21.2 + 10.6);
}

/** Clicks the middle of the drawing area (with a ring tool chosen, this places the ring there). */
export async function clickDrawingArea(page: Page) {
  const area = (await canvases(page)[1].boundingBox())!;
  await page.mouse.click(area.x + area.width / 2, area.y + area.height / 2);
}

/**
 * Screen positions of the drawn carbon atoms: their molfile coordinates (the editor writes its molecule into
 * the Paste tab's text box) scaled onto the box of dark bond pixels in a screenshot of the drawing area.
 * Valid while only carbons are drawn (every bond line then ends on an atom).
 */
export async function carbonPositions(page: Page): Promise<{ x: number; y: number }[]> {
  await page.getByRole('tab', { name: 'Paste or file' }).click();
  const molfile = await page.getByLabel('SMILES or molfile').inputValue();
  await openDrawTab(page);
  const atoms = molfile
    .split('\n')
    .filter((line) => / C /.test(line))
    .map((line) => line.trim().split(/\s+/).slice(0, 2).map(Number));
  const area = canvases(page)[1];
  const box = (await area.boundingBox())!;
  const { data, info } = await sharp(await area.screenshot())
    .raw()
    .toBuffer({ resolveWithObject: true });
  let [left, top, right] = [Infinity, Infinity, -1];
  for (let y = 0; y < info.height; y++) {
    for (let x = 0; x < info.width; x++) {
      const at = (y * info.width + x) * info.channels;
      if (data[at] < 120 && data[at + 1] < 120 && data[at + 2] < 120)
        [left, top, right] = [Math.min(left, x), Math.min(top, y), Math.max(right, x)];
    }
  }
  const xs = atoms.map(([x]) => x);
  const ys = atoms.map(([, y]) => y);
  const scale = (right - left) / (Math.max(...xs) - Math.min(...xs));
  return atoms.map(([x, y]) => ({
    x: box.x + left + (x - Math.min(...xs)) * scale,
    y: box.y + top + (Math.max(...ys) - y) * scale,
  }));
}

/**
 * Draws pyridine in OpenChemLib's editor with the mouse: the benzene tool, a click in the drawing area,
 * then the N tool on the ring's top atom. Tool positions are those of OpenChemLib 9.25's toolbar; the
 * atom is found from the editor's molfile (shown in the paste tab) scaled onto the drawn pixels.
 */
export async function drawPyridine(page: Page) {
  await openDrawTab(page);
  await chooseTool(page, 'benzene');
  await clickDrawingArea(page);
  const atoms = await carbonPositions(page);
  if (atoms.length !== 6) throw new Error(`Expected the drawn benzene ring to have 6 carbons, found ${atoms.length}.`);
  const topAtom = atoms.reduce((best, atom) => (atom.y < best.y ? atom : best));
  await chooseTool(page, 'N');
  await page.mouse.click(topAtom.x, topAtom.y);
}
