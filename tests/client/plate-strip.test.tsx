import { describe, expect, it } from 'vitest';
import { render, screen } from '@testing-library/react';
import { PlateStrip, type PlateLane } from '../../src/components/plate-strip';

const y = (el: Element, attr: string) => Number(el.getAttribute(attr));

/** Rf = distance of the spot from the origin / distance of the front from the origin (definition of Rf). */
function expectedY(rf: number, svg: Element, lane = 0) {
  const origin = svg.querySelectorAll('[data-part="origin"]')[lane];
  const front = svg.querySelectorAll('[data-part="front"]')[lane];
  return y(origin, 'y1') - rf * (y(origin, 'y1') - y(front, 'y1'));
}

const lane: PlateLane = {
  label: 'hexane/EtOAc 4:1',
  spots: [
    { rf: 0.32, role: 'target' },
    { rf: 0.55, role: 'starting_material' },
    { rf: 0.12, role: 'by_product' },
  ],
};

describe('PlateStrip', () => {
  it.each(['sm', 'lg'] as const)(
    'in the %s size, draws the origin below the front and one dot per spot at its Rf',
    (size) => {
      render(<PlateStrip lanes={[lane]} size={size} />);
      const svg = screen.getByRole('img');
      const origin = svg.querySelector('[data-part="origin"]')!;
      const front = svg.querySelector('[data-part="front"]')!;
      expect(y(origin, 'y1')).toBeGreaterThan(y(front, 'y1'));
      const spots = svg.querySelectorAll('[data-part="spot"]');
      expect(spots).toHaveLength(3);
      spots.forEach((spot, i) => expect(y(spot, 'cy')).toBeCloseTo(expectedY(lane.spots[i].rf, svg), 6));
    },
  );

  it('draws the starting material hollow and the target filled in the spot colour', () => {
    render(<PlateStrip lanes={[lane]} />);
    const svg = screen.getByRole('img');
    const sm = svg.querySelector('[data-role="starting_material"]')!;
    const target = svg.querySelector('[data-role="target"]')!;
    expect(sm.getAttribute('class')).toMatch(/\bfill-surface\b/);
    expect(sm.getAttribute('class')).toMatch(/\bstroke-ink-soft\b/);
    expect(target.getAttribute('class')).toMatch(/\bfill-spot\b/);
  });

  it('describes every Rf for assistive technology, lane by lane', () => {
    render(<PlateStrip lanes={[lane, { label: 'DCM/MeOH 95:5', spots: [{ rf: 0.41, role: 'target' }] }]} size="lg" />);
    const svg = screen.getByRole('img', { name: 'TLC plate, 2 lanes' });
    expect(svg).toHaveAccessibleDescription(
      'hexane/EtOAc 4:1: target Rf 0.32; starting material Rf 0.55; by-product Rf 0.12. DCM/MeOH 95:5: target Rf 0.41.',
    );
  });

  it('puts the second lane to the right of the first', () => {
    render(<PlateStrip lanes={[lane, { spots: [{ rf: 0.5, role: 'target' }] }]} />);
    const svg = screen.getByRole('img');
    const first = svg.querySelectorAll('[data-role="target"]')[0];
    const second = svg.querySelectorAll('[data-role="target"]')[1];
    expect(y(second, 'cx')).toBeGreaterThan(y(first, 'cx'));
    expect(y(second, 'cy')).toBeCloseTo(expectedY(0.5, svg, 1), 6);
  });

  it('for a Scout estimate, spans the interval band from the low to the high Rf and shows the neighbours faintly', () => {
    render(
      <PlateStrip
        size="lg"
        lanes={[{ spots: [], predicted: { rf: 0.3, low: 0.22, high: 0.39 }, neighbours: [0.25, 0.36] }]}
      />,
    );
    const svg = screen.getByRole('img');
    const band = svg.querySelector('[data-part="interval"]')!;
    expect(y(band, 'y')).toBeCloseTo(expectedY(0.39, svg), 6);
    expect(y(band, 'y') + y(band, 'height')).toBeCloseTo(expectedY(0.22, svg), 6);
    const neighbours = svg.querySelectorAll('[data-part="neighbour"]');
    expect([...neighbours].map((n) => y(n, 'cy'))).toEqual([expectedY(0.25, svg), expectedY(0.36, svg)]);
    neighbours.forEach((n) => expect(Number(n.getAttribute('opacity'))).toBeLessThan(0.5));
    expect(svg).toHaveAccessibleDescription(
      /predicted target Rf 0\.30 \(interval 0\.22–0\.39\); neighbours Rf 0\.25, 0\.36/,
    );
  });

  it('keeps an out-of-range Rf on the plate (clamped to the front) while the description gives the recorded value', () => {
    render(<PlateStrip lanes={[{ spots: [{ rf: 1.2, role: 'unknown' }] }]} />);
    const svg = screen.getByRole('img');
    expect(y(svg.querySelector('[data-part="spot"]')!, 'cy')).toBeCloseTo(expectedY(1, svg), 6);
    expect(svg).toHaveAccessibleDescription(/unknown spot Rf 1\.20/);
  });
});
