import { Axes, ChartFigure, axisTitle, plotBox, type ChartAxis } from './chart-frame';
import { linear, niceDomain, type Bin } from './chart-scale';

export { binValues } from './chart-scale';

interface ScatterPoint {
  x: number;
  y: number;
  /** Shown on hover and in the hidden table, e.g. the record it came from. */
  label?: string;
  highlight?: boolean;
}

interface ScatterProps {
  title: string;
  x: ChartAxis;
  y: ChartAxis;
  points: ScatterPoint[];
  /** A fitted curve drawn over the x domain, named by what it is (e.g. "Soczewiński fit, R² 0.97"). */
  fit?: { f: (x: number) => number; label: string };
}

const fmt = (v: number) => (Number.isInteger(v) ? String(v) : v.toPrecision(3));

/** Points on two labelled axes with an optional fitted line (no chart library). */
export function Scatter({ title, x, y, points, fit }: ScatterProps) {
  const xDomain = x.domain ?? niceDomain(points.map((p) => p.x));
  const yDomain = y.domain ?? niceDomain(points.map((p) => p.y));
  const inset = 8;
  const sx = linear(xDomain, [plotBox.x0 + inset, plotBox.x1 - inset]);
  const sy = linear(yDomain, [plotBox.y0 - inset, plotBox.y1 + inset]);
  const inY = (v: number) => Number.isFinite(v) && v >= yDomain[0] && v <= yDomain[1];
  const curve = fit
    ? Array.from({ length: 61 }, (_, i) => xDomain[0] + ((xDomain[1] - xDomain[0]) * i) / 60)
        .map((vx) => ({ vx, vy: fit.f(vx) }))
        .filter((p) => inY(p.vy))
        .map((p, i) => `${i ? 'L' : 'M'}${sx(p.vx).toFixed(1)} ${sy(p.vy).toFixed(1)}`)
        .join(' ')
    : '';
  const summary =
    `${points.length} point${points.length === 1 ? '' : 's'} of ${axisTitle(y)} against ` +
    `${axisTitle(x)}${fit ? `; line: ${fit.label}` : ''}.`;
  return (
    <ChartFigure
      title={title}
      summary={summary}
      table={
        <tbody>
          <tr>
            <th>{axisTitle(x)}</th>
            <th>{axisTitle(y)}</th>
            <th>Point</th>
          </tr>
          {points.map((p, i) => (
            <tr key={i}>
              <td>{fmt(p.x)}</td>
              <td>{fmt(p.y)}</td>
              <td>{p.label ?? ''}</td>
            </tr>
          ))}
        </tbody>
      }
    >
      <Axes x={x} y={y} xDomain={xDomain} yDomain={yDomain} sx={sx} sy={sy} />
      {curve && (
        <path data-part="fit" d={curve} fill="none" className="stroke-front" strokeWidth={1.5} strokeDasharray="5 3" />
      )}
      {points.map((p, i) => (
        <circle
          key={i}
          data-part="point"
          cx={sx(p.x)}
          cy={sy(p.y)}
          r={p.highlight ? 5 : 4}
          className={p.highlight ? 'fill-spot stroke-spot-dark' : 'fill-ink-soft/80 stroke-surface'}
        >
          <title>
            {`${p.label ? p.label + ': ' : ''}${fmt(p.x)}${x.unit ? ' ' + x.unit : ''}, ` +
              `${fmt(p.y)}${y.unit ? ' ' + y.unit : ''}`}
          </title>
        </circle>
      ))}
      {fit && (
        <text x={plotBox.x1} y={plotBox.y1 - 10} textAnchor="end" fontSize={11} className="fill-front">
          — — {fit.label}
        </text>
      )}
    </ChartFigure>
  );
}

interface HistogramProps {
  title: string;
  x: ChartAxis;
  /** What is counted, e.g. "records". */
  countLabel: string;
  bins: Bin[];
  /** A value to mark with a vertical line (e.g. this compound's Rf), with its name. */
  marker?: { value: number; label: string };
}

/** Counts in bins on a labelled x axis (for distributions on class pages). */
export function Histogram({ title, x, countLabel, bins, marker }: HistogramProps) {
  const xDomain = x.domain ?? (bins.length ? ([bins[0].from, bins[bins.length - 1].to] as [number, number]) : [0, 1]);
  const yDomain = niceDomain([0, ...bins.map((b) => b.count)], [0, 1]);
  const sx = linear(xDomain, [plotBox.x0, plotBox.x1]);
  const sy = linear([0, yDomain[1]], [plotBox.y0, plotBox.y1]);
  const total = bins.reduce((n, b) => n + b.count, 0);
  return (
    <ChartFigure
      title={title}
      summary={`${total} ${countLabel} in ${bins.length} bins of ${axisTitle(x)}.`}
      table={
        <tbody>
          <tr>
            <th>{axisTitle(x)}</th>
            <th>{countLabel}</th>
          </tr>
          {bins.map((b, i) => (
            <tr key={i}>
              <td>{`${fmt(b.from)}–${fmt(b.to)}`}</td>
              <td>{b.count}</td>
            </tr>
          ))}
        </tbody>
      }
    >
      <Axes x={x} y={{ label: countLabel }} xDomain={xDomain} yDomain={[0, yDomain[1]]} sx={sx} sy={sy} />
      {bins.map((b, i) => (
        <rect
          key={i}
          data-part="bar"
          x={sx(b.from) + 1}
          width={Math.max(0, sx(b.to) - sx(b.from) - 2)}
          y={sy(b.count)}
          height={plotBox.y0 - sy(b.count)}
          className="fill-front/75"
        >
          <title>{`${fmt(b.from)}–${fmt(b.to)}${x.unit ? ' ' + x.unit : ''}: ${b.count} ${countLabel}`}</title>
        </rect>
      ))}
      {marker && (
        <g className="fill-spot-dark">
          <line
            x1={sx(marker.value)}
            x2={sx(marker.value)}
            y1={plotBox.y0}
            y2={plotBox.y1 - 4}
            className="stroke-spot-dark"
            strokeWidth={2}
            strokeDasharray="4 2"
          />
          <text x={sx(marker.value)} y={plotBox.y1 - 8} fontSize={11} textAnchor="middle">
            {marker.label}
          </text>
        </g>
      )}
    </ChartFigure>
  );
}
