import type { ReactNode } from 'react';
import { formatTick, niceTicks } from './chart-scale';

/** A chart axis: its name, unit and (optionally) fixed domain. */
export interface ChartAxis {
  label: string;
  unit?: string;
  domain?: [number, number];
}

const frame = { width: 400, height: 260, left: 50, right: 12, top: 24, bottom: 42 };
export const plotBox = {
  x0: frame.left,
  x1: frame.width - frame.right,
  y0: frame.height - frame.bottom,
  y1: frame.top,
};

export const axisTitle = (a: ChartAxis) => (a.unit ? `${a.label} (${a.unit})` : a.label);

interface AxesProps {
  x: ChartAxis;
  y: ChartAxis;
  xDomain: [number, number];
  yDomain: [number, number];
  sx: (v: number) => number;
  sy: (v: number) => number;
}

/** Frame, grid lines, ticks with figures and axis titles with units. */
export function Axes({ x, y, xDomain, yDomain, sx, sy }: AxesProps) {
  const xt = niceTicks(xDomain[0], xDomain[1], 6);
  const yt = niceTicks(yDomain[0], yDomain[1], 5);
  const xs = xt.length > 1 ? xt[1] - xt[0] : 1;
  const ys = yt.length > 1 ? yt[1] - yt[0] : 1;
  return (
    <g aria-hidden="true" fontSize={11} className="fill-ink-soft">
      {yt.map((v) => (
        <g key={`y${v}`}>
          <line x1={plotBox.x0} x2={plotBox.x1} y1={sy(v)} y2={sy(v)} className="stroke-line" strokeWidth={0.7} />
          <text x={plotBox.x0 - 6} y={sy(v) + 4} textAnchor="end" fontFamily="IBM Plex Mono, monospace">
            {formatTick(v, ys)}
          </text>
        </g>
      ))}
      {xt.map((v) => (
        <g key={`x${v}`}>
          <line x1={sx(v)} x2={sx(v)} y1={plotBox.y0} y2={plotBox.y0 + 4} className="stroke-ink-soft" />
          <text x={sx(v)} y={plotBox.y0 + 16} textAnchor="middle" fontFamily="IBM Plex Mono, monospace">
            {formatTick(v, xs)}
          </text>
        </g>
      ))}
      <line x1={plotBox.x0} x2={plotBox.x1} y1={plotBox.y0} y2={plotBox.y0} className="stroke-ink-soft" />
      <line x1={plotBox.x0} x2={plotBox.x0} y1={plotBox.y0} y2={plotBox.y1} className="stroke-ink-soft" />
      <text x={(plotBox.x0 + plotBox.x1) / 2} y={frame.height - 6} textAnchor="middle" className="fill-ink">
        {axisTitle(x)}
      </text>
      <text
        transform={`translate(13 ${(plotBox.y0 + plotBox.y1) / 2}) rotate(-90)`}
        textAnchor="middle"
        className="fill-ink"
      >
        {axisTitle(y)}
      </text>
    </g>
  );
}

/** A captioned figure: the SVG is one image for assistive technology, with the numbers in a hidden table. */
export function ChartFigure({
  title,
  summary,
  table,
  children,
}: {
  title: string;
  summary: string;
  table: ReactNode;
  children: ReactNode;
}) {
  return (
    <figure className="relative w-full">
      <figcaption className="mb-1 text-sm font-medium text-ink">{title}</figcaption>
      <svg
        role="img"
        aria-label={`${title}. ${summary}`}
        viewBox={`0 0 ${frame.width} ${frame.height}`}
        className="h-auto w-full max-w-lg"
      >
        {children}
      </svg>
      {/* In a hidden box, not a hidden table: a table never shrinks below its content, and would widen the page. */}
      <div className="sr-only">
        <table>
          <caption>{title}</caption>
          {table}
        </table>
      </div>
    </figure>
  );
}
