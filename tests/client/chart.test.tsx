import { describe, expect, it } from 'vitest';
import { render, screen } from '@testing-library/react';
import { Histogram, Scatter, binValues } from '../../src/components/ui/chart';
import { niceTicks } from '../../src/components/ui/chart-scale';

describe('chart helpers', () => {
  it('picks round tick steps of 1, 2 or 5 × 10ⁿ', () => {
    expect(niceTicks(0, 1, 5)).toEqual([0, 0.2, 0.4, 0.6, 0.8, 1]);
    expect(niceTicks(3, 47, 5)).toEqual([10, 20, 30, 40]);
  });

  it('counts values into bins, an edge value going to the upper bin and the top edge to the last', () => {
    expect(binValues([0, 0.1, 0.25, 0.5, 0.99, 1, 1.5], 0, 1, 0.5).map((b) => b.count)).toEqual([3, 3]);
  });
});

describe('Scatter and Histogram', () => {
  it('draw a point per datum, place a higher y higher, and list the numbers with units in a table', () => {
    render(
      <Scatter
        title="Rf against EtOAc"
        x={{ label: 'EtOAc', unit: '% v/v' }}
        y={{ label: 'Rf', domain: [0, 1] }}
        points={[
          { x: 10, y: 0.1 },
          { x: 30, y: 0.5 },
        ]}
        fit={{ f: (x) => x / 60, label: 'line' }}
      />,
    );
    const img = screen.getByRole('img', {
      name: /Rf against EtOAc\. 2 points of Rf against EtOAc \(% v\/v\); line: line\./,
    });
    const points = img.querySelectorAll('[data-part="point"]');
    expect(points).toHaveLength(2);
    expect(Number(points[1].getAttribute('cy'))).toBeLessThan(Number(points[0].getAttribute('cy')));
    expect(img.querySelector('[data-part="fit"]')?.getAttribute('d')).toMatch(/^M/);
    expect(screen.getByRole('table', { name: 'Rf against EtOAc' })).toHaveTextContent('EtOAc (% v/v)');
  });

  it('draw bars whose heights follow the counts', () => {
    render(
      <Histogram
        title="Target Rf"
        x={{ label: 'Rf', domain: [0, 1] }}
        countLabel="records"
        bins={binValues([0.1, 0.6, 0.7], 0, 1, 0.5)}
      />,
    );
    const bars = screen.getByRole('img', { name: /3 records in 2 bins/ }).querySelectorAll('[data-part="bar"]');
    expect(Number(bars[1].getAttribute('height'))).toBeCloseTo(2 * Number(bars[0].getAttribute('height')), 6);
  });
});
