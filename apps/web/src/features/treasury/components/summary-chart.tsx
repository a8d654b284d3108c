import type { SummaryDto } from '@app/shared';
import { formatMoney } from '@app/shared/locale';

const W = 640;
const H = 260;
const PAD = { top: 16, right: 16, bottom: 40, left: 64 };

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];
const monthLabel = (ym: string) => MONTHS[Number(ym.slice(5, 7)) - 1] ?? ym;

/**
 * Collected vs expected, running totals by month of the fiscal year, drawn as two lines. The SVG has a title and
 * description for screen readers, and the same figures follow in a table.
 */
export function SummaryChart({ summary }: { summary: SummaryDto }) {
  const points = summary.months.reduce<{ month: string; collected: number; expected: number }[]>(
    (acc, m) => {
      const prev = acc[acc.length - 1];
      acc.push({
        month: m.month,
        collected: (prev?.collected ?? 0) + m.collectedMinor,
        expected: (prev?.expected ?? 0) + m.expectedMinor,
      });
      return acc;
    },
    [],
  );
  const last = points[points.length - 1];
  const c = last?.collected ?? 0;
  const e = last?.expected ?? 0;
  const max = Math.max(1, ...points.map((p) => Math.max(p.collected, p.expected)));
  const innerW = W - PAD.left - PAD.right;
  const innerH = H - PAD.top - PAD.bottom;
  const x = (i: number) => PAD.left + (points.length <= 1 ? 0 : (i * innerW) / (points.length - 1));
  const y = (v: number) => PAD.top + innerH - (Math.max(0, v) / max) * innerH;
  const line = (key: 'collected' | 'expected') =>
    points
      .map((p, i) => `${i === 0 ? 'M' : 'L'}${x(i).toFixed(1)},${y(p[key]).toFixed(1)}`)
      .join(' ');
  const money = (v: number) => formatMoney(v, summary.currency);
  const ticks = [0, 0.25, 0.5, 0.75, 1].map((f) => Math.round(max * f));
  return (
    <figure className="flex flex-col gap-2">
      <svg
        viewBox={`0 0 ${W} ${H}`}
        role="img"
        aria-labelledby="summary-chart-title summary-chart-desc"
        className="h-auto w-full max-w-3xl rounded-lg border border-sand-300 bg-sand-50"
      >
        <title id="summary-chart-title">
          Collected vs expected dues, {summary.fiscalYear.label}
        </title>
        <desc id="summary-chart-desc">
          Running totals by month. By the end of the year {money(e)} is expected; {money(c)} has
          been collected so far.
        </desc>
        {ticks.map((t) => (
          <g key={t}>
            <line
              x1={PAD.left}
              x2={W - PAD.right}
              y1={y(t)}
              y2={y(t)}
              className="stroke-sand-300"
            />
            <text
              x={PAD.left - 6}
              y={y(t) + 4}
              textAnchor="end"
              className="fill-ink-700 text-[11px]"
            >
              {money(t)}
            </text>
          </g>
        ))}
        {points.map((p, i) => (
          <text
            key={p.month}
            x={x(i)}
            y={H - PAD.bottom + 18}
            textAnchor="middle"
            className="fill-ink-700 text-[11px]"
          >
            {monthLabel(p.month)}
          </text>
        ))}
        <path
          d={line('expected')}
          fill="none"
          strokeWidth={2.5}
          strokeDasharray="6 4"
          className="stroke-ink-600"
        />
        <path d={line('collected')} fill="none" strokeWidth={3} className="stroke-signal-600" />
        {points.map((p, i) => (
          <circle key={p.month} cx={x(i)} cy={y(p.collected)} r={3.5} className="fill-signal-600" />
        ))}
      </svg>
      <figcaption className="flex flex-wrap gap-4 text-sm">
        <span>
          <span
            aria-hidden="true"
            className="mr-1 inline-block h-1 w-6 bg-signal-600 align-middle"
          />
          Collected (net of refunds)
        </span>
        <span>
          <span
            aria-hidden="true"
            className="mr-1 inline-block h-0 w-6 border-t-2 border-dashed border-ink-600 align-middle"
          />
          Expected
        </span>
      </figcaption>
      <details>
        <summary className="cursor-pointer text-sm font-bold">Figures by month</summary>
        <table className="mt-2 w-full max-w-xl text-sm">
          <thead>
            <tr>
              <th scope="col" className="text-left">
                Month
              </th>
              <th scope="col" className="text-right">
                Collected
              </th>
              <th scope="col" className="text-right">
                Expected
              </th>
            </tr>
          </thead>
          <tbody>
            {summary.months.map((m) => (
              <tr key={m.month} className="border-t border-sand-300">
                <th scope="row" className="text-left font-normal">
                  {m.month}
                </th>
                <td className="text-right tabular-nums">{money(m.collectedMinor)}</td>
                <td className="text-right tabular-nums">{money(m.expectedMinor)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </details>
    </figure>
  );
}
