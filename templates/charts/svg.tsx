/** Server-rendered SVG of a chart model (see layout.ts); titled, labelled, with a legend; prints well. */
import type { ChartModel, UnitSystem } from '../../core/index.js';
import { layoutChart } from './layout.js';

/** Coordinates are drawn to 0.1 px: finer digits only make the page heavier. */
const r1 = (v: number): number => Math.round(v * 10) / 10;
const roundPath = (d: string): string => d.replace(/-?\d+\.\d+(e-?\d+)?/g, (m) => String(r1(Number(m))));

export function ChartSvg(props: { model: ChartModel; units: UnitSystem }) {
  const c = layoutChart(props.model, props.units);
  const { box, plot } = c;
  return (
    <figure class="chart" id={`chart-${props.model.id}`}>
      <svg viewBox={`0 0 ${box.width} ${box.height}`} role="img" aria-labelledby={`chart-${props.model.id}-title`} xmlns="http://www.w3.org/2000/svg">
        <title id={`chart-${props.model.id}-title`}>{c.title}</title>
        <text x={box.width / 2} y={18} text-anchor="middle" class="chart-title">{c.title}</text>
        <rect x={plot.x0} y={plot.y1} width={plot.x1 - plot.x0} height={plot.y0 - plot.y1} fill="#fff" stroke="#8a96a3" />
        {c.yTicks.map((t) => (
          <g>
            <line x1={plot.x0} x2={plot.x1} y1={r1(t.pos)} y2={r1(t.pos)} stroke="#e3e8ee" />
            <text x={plot.x0 - 6} y={r1(t.pos + 4)} text-anchor="end" class="tick">{t.label}</text>
          </g>
        ))}
        {c.xTicks.map((t) => (
          <g>
            <line x1={r1(t.pos)} x2={r1(t.pos)} y1={plot.y0} y2={plot.y0 + 4} stroke="#8a96a3" />
            {c.categorical
              ? <text x={r1(t.pos)} y={plot.y0 + 14} text-anchor="end" class="tick" transform={`rotate(-30 ${r1(t.pos)} ${plot.y0 + 14})`}>{t.label}</text>
              : <text x={r1(t.pos)} y={plot.y0 + 16} text-anchor="middle" class="tick">{t.label}</text>}
          </g>
        ))}
        {c.categorical ? null : <text x={(plot.x0 + plot.x1) / 2} y={plot.y0 + 32} text-anchor="middle" class="axis-label">{c.xLabel}</text>}
        <text x={14} y={(plot.y0 + plot.y1) / 2} text-anchor="middle" class="axis-label" transform={`rotate(-90 14 ${(plot.y0 + plot.y1) / 2})`}>{c.yLabel}</text>
        {c.rules.map((r) => (
          <g>
            <line x1={r1(r.x1)} y1={r1(r.y1)} x2={r1(r.x2)} y2={r1(r.y2)} stroke="#444" stroke-dasharray="4 3" />
            <text x={r1(r.lx)} y={r1(r.ly)} text-anchor={r.anchor} class="rule-label">{r.label}</text>
          </g>
        ))}
        {c.series.map((s) => (
          <g>
            {s.path ? <path d={roundPath(s.path)} fill="none" stroke={s.colour} stroke-width={s.emphasis ? 3 : 1.6} stroke-dasharray={s.dash || undefined} /> : null}
            {s.markers.map((m) => <circle cx={r1(m.x)} cy={r1(m.y)} r={s.emphasis ? 3.5 : 2.5} fill={s.colour} />)}
            {s.bars.map((b) => <rect x={r1(b.x)} y={r1(b.y)} width={r1(b.width)} height={r1(b.height)} fill={s.colour} />)}
          </g>
        ))}
      </svg>
      <figcaption class="legend">
        {c.series.map((s) => (
          <span class="legend-item">
            <svg width="22" height="10" aria-hidden="true"><line x1="1" x2="21" y1="5" y2="5" stroke={s.colour} stroke-width={s.emphasis ? 3 : 2} stroke-dasharray={s.dash || undefined} /></svg>
            {s.name}
          </span>
        ))}
        {c.rules.map((r) => <span class="legend-item legend-rule">- - {r.label}</span>)}
      </figcaption>
    </figure>
  );
}
