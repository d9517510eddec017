import { Axes, ChartFigure, axisTitle, plotBox } from '../../../components/ui/chart-frame';
import { linear } from '../../../components/ui/chart-scale';
import { solventByKey } from '../../../../shared/catalogue/solvents';
import type { ScoutResult } from '../../../../shared/schemas/scout';
import { neighbourPointsInPair } from './neighbour-spots';

const fmt = (v: number) => (Number.isInteger(v) ? String(v) : v.toFixed(2));

/**
 * The useful span of the x axis: the compositions where the predicted Rf lies between 0.05 and 0.9, widened to
 * hold the suggestion and the neighbours' plates, on a 5 % grid — not 0–100 % when all the action is below 20 %.
 */
function usefulDomain(curve: { strongPercent: number; rf: number }[], extra: number[]): [number, number] {
  const useful = curve.filter((point) => point.rf >= 0.05 && point.rf <= 0.9).map((point) => point.strongPercent);
  const values = [...useful, ...extra];
  if (values.length === 0) return [0, 100];
  const low = Math.max(0, Math.floor(Math.min(...values) / 5) * 5);
  const high = Math.min(100, Math.ceil(Math.max(...values) / 5) * 5);
  return high - low >= 10 ? [low, high] : [Math.max(0, low - 5), Math.min(100, low + 15)];
}

/** The predicted Rf across compositions of the pair with its 90 % band, the neighbours' plates and the suggestion. */
export function ResponseCurve({ result }: { result: ScoutResult }) {
  const suggestion = result.suggestion;
  if (!suggestion) return null;
  const curve = [...suggestion.curve].sort((a, b) => a.strongPercent - b.strongPercent);
  const strong = solventByKey(suggestion.pair.strong)?.label ?? suggestion.pair.strong;
  const points = neighbourPointsInPair(result);
  const xDomain = usefulDomain(curve, [suggestion.strongPercent, ...points.map((point) => point.x)]);
  const x = { label: `% ${strong}`, unit: 'v/v', domain: xDomain };
  const y = { label: 'Rf', domain: [0, 1] as [number, number] };
  const inset = 8;
  const sx = linear(xDomain, [plotBox.x0 + inset, plotBox.x1 - inset]);
  const sy = linear(y.domain, [plotBox.y0 - inset, plotBox.y1 + inset]);
  const shown = curve.filter(
    (point) => point.strongPercent >= xDomain[0] - 1e-9 && point.strongPercent <= xDomain[1] + 1e-9,
  );
  const path = (values: [number, number][]) =>
    values.map(([px, py], i) => `${i ? 'L' : 'M'}${sx(px).toFixed(1)} ${sy(py).toFixed(1)}`).join(' ');
  const band =
    shown.length > 1
      ? `${path(shown.map((point) => [point.strongPercent, point.upper]))} ` +
        `${path([...shown].reverse().map((point) => [point.strongPercent, point.lower])).replace(/^M/, 'L')} Z`
      : '';
  const summary =
    `Scout's predicted Rf against % ${strong} with its 90 % interval as a band, ` +
    `${points.length} plate${points.length === 1 ? '' : 's'} of neighbours, and the suggestion ` +
    `(${suggestion.notation}, Rf ${fmt(suggestion.predictedRf)}).`;
  return (
    <ChartFigure
      title={`Rf against % ${strong}`}
      summary={summary}
      table={
        <tbody>
          <tr>
            <th>{axisTitle(x)}</th>
            <th>predicted Rf</th>
            <th>90 % interval</th>
          </tr>
          {shown.map((point) => (
            <tr key={point.strongPercent}>
              <td>{fmt(point.strongPercent)}</td>
              <td>{fmt(point.rf)}</td>
              <td>
                {fmt(point.lower)}–{fmt(point.upper)}
              </td>
            </tr>
          ))}
        </tbody>
      }
    >
      <Axes x={x} y={y} xDomain={xDomain} yDomain={y.domain} sx={sx} sy={sy} />
      {band && <path data-part="band" d={band} className="fill-front/15 stroke-none" />}
      {shown.length > 1 && (
        <path
          data-part="fit"
          d={path(shown.map((point) => [point.strongPercent, point.rf]))}
          fill="none"
          className="stroke-front"
          strokeWidth={1.5}
          strokeDasharray="5 3"
        />
      )}
      {points
        .filter((point) => point.x >= xDomain[0] && point.x <= xDomain[1])
        .map((point, i) => (
          <circle
            key={i}
            data-part="point"
            cx={sx(point.x)}
            cy={sy(point.y)}
            r={4}
            className="fill-ink-soft/80 stroke-surface"
          >
            <title>{`${point.label ? `${point.label}: ` : ''}${fmt(point.x)} %, Rf ${fmt(point.y)}`}</title>
          </circle>
        ))}
      <circle
        data-part="point"
        cx={sx(suggestion.strongPercent)}
        cy={sy(suggestion.predictedRf)}
        r={5}
        className="fill-spot stroke-spot-dark"
      >
        <title>
          {`suggested: ${suggestion.label}, Rf ${fmt(suggestion.predictedRf)} (90 %: ` +
            `${fmt(suggestion.interval[0])}–${fmt(suggestion.interval[1])})`}
        </title>
      </circle>
    </ChartFigure>
  );
}
