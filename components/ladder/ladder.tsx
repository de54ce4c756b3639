'use client';
// The ladder: the cycle drawn to scale. Rungs are the states of the system; arrows are the steps.
// Up (absorbs energy): solid shaft, filled head, ▲. Down (releases): dashed shaft, open head, ▼.
// The unknown is drawn heavier with a marked label. Colour only repeats what shape and label say.
import { memo } from 'react';
import { energyText, formatEnergy, type DisplayUnit } from '@/lib/workbench/format-energy';
import type { LadderGeometry } from '@/lib/workbench/ladder-geometry';

export interface LadderProps {
  geometry: LadderGeometry;
  unit: DisplayUnit;
  title: string;
  /** id of the table of steps that is the text alternative of this drawing. */
  describedBy?: string;
}

const UP = '#8a3c1c';
const DOWN = '#2a4f70';
const RUNG = '#1e2b33';

/** Spread rung labels so they never overlap (at least `gap` apart), keeping their order. */
function spreadLabels(ys: number[], gap: number, top: number): number[] {
  const order = ys.map((y, i) => ({ y, i })).sort((a, b) => a.y - b.y);
  const out = new Array<number>(ys.length);
  let last = top - gap;
  for (const { y, i } of order) {
    const placed = Math.max(y, last + gap);
    out[i] = placed;
    last = placed;
  }
  return out;
}

export const Ladder = memo(function Ladder({ geometry: g, unit, title, describedBy }: LadderProps) {
  const labelYs = spreadLabels(
    g.rungs.map((r) => r.y),
    13,
    g.top - 10,
  );
  const height = Math.max(g.height, (labelYs.reduce((a, b) => Math.max(a, b), 0) ?? 0) + 20);
  return (
    <figure className="ladder-figure">
      <svg viewBox={`0 0 ${g.width} ${height}`} role="img" aria-labelledby="ladder-title ladder-desc" {...(describedBy ? { 'aria-describedby': describedBy } : {})} className="h-auto w-full" data-testid="ladder">
        <title id="ladder-title">{title}</title>
        <desc id="ladder-desc">
          Energy levels of the cycle drawn to scale, elements in their standard states at zero. Upward steps absorb energy, downward steps release it. The table of steps gives the same values as text.
        </desc>
        <defs>
          {/* Heads point along the shaft (+x in marker space): filled for up, open for down. */}
          <marker id="head-up" viewBox="0 0 10 10" refX="9" refY="5" markerWidth="10" markerHeight="10" markerUnits="userSpaceOnUse" orient="auto">
            <path d="M0 0 L10 5 L0 10 Z" fill={UP} />
          </marker>
          <marker id="head-down" viewBox="0 0 10 10" refX="9" refY="5" markerWidth="11" markerHeight="11" markerUnits="userSpaceOnUse" orient="auto">
            <path d="M1 1 L9 5 L1 9" fill="none" stroke={DOWN} strokeWidth="1.6" />
          </marker>
        </defs>
        {/* zero: the elements in their standard states */}
        {g.rungs.map((r, i) => (
          <g key={`r${i}`}>
            <line x1={r.x1} x2={r.x2} y1={r.y} y2={r.y} stroke={RUNG} strokeWidth={i === 0 ? 2.2 : 1.4} strokeLinecap="round" />
            <line x1={200} x2={r.x1} y1={labelYs[i]} y2={r.y} stroke="#b9b2a5" strokeWidth={0.6} />
            <text x={4} y={(labelYs[i] ?? r.y) + 3.5} fontSize={10.5} fill={RUNG}>
              {r.label}
            </text>
          </g>
        ))}
        {g.arrows.map((a) => {
          const up = a.direction === 'up';
          const color = up ? UP : DOWN;
          const f = formatEnergy(a.changeKj, unit, null, { signed: true });
          const mid = (a.yFrom + a.yTo) / 2;
          // Labels sit right of the arrow, or left of it near the right edge.
          const leftSide = a.x > g.width - 130;
          const tx = leftSide ? a.x - 8 : a.x + 6;
          const anchor = leftSide ? 'end' : 'start';
          return (
            <g key={a.key} data-step={a.key} data-direction={a.direction}>
              {a.unknown ? <rect x={a.x - 7} y={Math.min(a.yFrom, a.yTo) - 2} width={14} height={Math.abs(a.yTo - a.yFrom) + 4} fill="#d5ece7" stroke="#1d554d" strokeDasharray="2 2" rx={3} /> : null}
              <line
                x1={a.x}
                x2={a.x}
                y1={a.yFrom}
                y2={a.yTo}
                stroke={color}
                strokeWidth={a.unknown ? 3.2 : 1.8}
                strokeDasharray={up ? undefined : '5 3'}
                markerEnd={a.direction === 'flat' ? undefined : `url(#head-${up ? 'up' : 'down'})`}
              />
              <text x={tx} y={mid - 2} fontSize={10} fill={color} fontWeight={a.unknown ? 700 : 500} textAnchor={anchor}>
                {up ? '▲ ' : '▼ '}
                {a.short}
                {a.overridden ? ' *' : ''}
              </text>
              <text x={tx} y={mid + 10} fontSize={10} fill={color} fontWeight={a.unknown ? 700 : 400} textAnchor={anchor}>
                {f.value}
                {a.unknown ? ' (solved)' : ''}
              </text>
            </g>
          );
        })}
        <g aria-hidden="true">
          <line x1={g.width - 10} x2={g.width - 10} y1={g.bottom} y2={g.bottom - g.scaleBarLength} stroke={RUNG} strokeWidth={2} />
          <text transform={`translate(${g.width - 16} ${g.bottom - g.scaleBarLength / 2}) rotate(-90)`} fontSize={9.5} textAnchor="middle" fill={RUNG}>
            {energyText(g.scaleBarKj, unit)}
          </text>
        </g>
      </svg>
      <figcaption className="mt-2 flex flex-wrap gap-x-6 gap-y-1 text-sm text-ink-soft">
        <span>
          <span aria-hidden="true" style={{ color: UP }}>
            ▲ ━━
          </span>{' '}
          absorbs energy (up)
        </span>
        <span>
          <span aria-hidden="true" style={{ color: DOWN }}>
            ▼ ╍╍
          </span>{' '}
          releases energy (down)
        </span>
        <span>
          <span aria-hidden="true" className="rounded border border-dashed border-verdigris-700 bg-verdigris-100 px-1">
            (solved)
          </span>{' '}
          the unknown
        </span>
        <span>* overridden value</span>
        <span>Drawn to scale; the bar on the right is {energyText(g.scaleBarKj, unit)}.</span>
      </figcaption>
    </figure>
  );
});
