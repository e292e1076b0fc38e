import type { Comparison } from '@/engine/replay';

/** Drawing scale: px per second (at least), lane height, label column, axis band. */
const PX_PER_S = 120;
const LANE_H = 46;
const LABEL_W = 150;
const AXIS_H = 30;

/** Colours of our own: the machine's record in dark slate, the model in teal, disagreement in red. */
const RECORDED = '#334155';
const SIMULATED = '#0f766e';
const DIVERGED = '#b42318';

/**
 * Every observed signal on one time axis: the machine's recorded edges above the lane's middle,
 * the model's below, a paired edge joined with its timing difference in ms, an unmatched edge
 * ringed in red; the first divergence and the moment on show as vertical lines. Scrolls sideways
 * on a narrow screen rather than squeezing the time axis.
 */
export function EdgeLanes({ comparison, durationS, t, onPick }: { comparison: Comparison; durationS: number; t: number; onPick: (t: number) => void }) {
  const lanes = comparison.signals;
  const width = LABEL_W + Math.max(480, durationS * PX_PER_S) + 20;
  const height = lanes.length * LANE_H + AXIS_H;
  const x = (s: number) => LABEL_W + (s / Math.max(durationS, 1e-9)) * (width - LABEL_W - 20);
  const ticks = axisTicks(durationS);
  const divergence = comparison.firstDivergence;
  return (
    <figure className="overflow-x-auto rounded-md border border-rule bg-paper-raised" data-testid="edge-lanes">
      <svg width={width} height={height} role="img" aria-label="Recorded and simulated edges of every observed signal against time" onClick={(e) => {
        const box = e.currentTarget.getBoundingClientRect();
        const s = ((e.clientX - box.left - LABEL_W) / (width - LABEL_W - 20)) * durationS;
        if (s >= 0 && s <= durationS) onPick(s);
      }}>
        {lanes.map((lane, i) => {
          const top = i * LANE_H;
          const mid = top + LANE_H / 2;
          return (
            <g key={`${lane.tag}:${lane.word}`} data-testid="edge-lane" data-signal={`${lane.tag} ${lane.word}`}>
              <line x1={LABEL_W} x2={width - 20} y1={mid} y2={mid} stroke="#d5d9d2" />
              <text x={6} y={mid - 4} className="fill-ink text-[12px]">
                {lane.tag} {lane.word}
              </text>
              <text x={6} y={mid + 12} className="fill-ink-soft text-[10px]">
                {lane.kind === 'number' ? `RMS ${lane.rmsError !== undefined ? formatRms(lane.word, lane.rmsError) : '–'}` : `worst ${Math.round(lane.maxErrorMs)} ms${lane.missing + lane.extra ? ` · ${lane.missing} missing, ${lane.extra} extra` : ''}`}
              </text>
              {lane.pairs.map((p, k) =>
                p.simulatedS === null ? (
                  <circle key={`m${k}`} cx={x(p.recordedS)} cy={mid - 10} r={6} fill="none" stroke={DIVERGED} strokeWidth={2} data-testid="edge-missing" />
                ) : (
                  <g key={`p${k}`}>
                    <line x1={x(p.recordedS)} y1={mid - 4} x2={x(p.simulatedS)} y2={mid + 4} stroke={Math.abs(p.errorMs ?? 0) > 50 ? DIVERGED : '#6b7785'} strokeWidth={1.5} />
                    <text x={(x(p.recordedS) + x(p.simulatedS)) / 2 + 4} y={mid + 2} className={`text-[10px] ${Math.abs(p.errorMs ?? 0) > 50 ? 'fill-danger' : 'fill-ink-soft'}`} data-testid="edge-error">
                      {formatMs(p.errorMs ?? 0)}
                    </text>
                  </g>
                ),
              )}
              {lane.recordedEdges.map((edge, k) => (
                <path key={`r${k}`} d={`M ${x(edge.t)} ${mid - 4} v -12`} stroke={RECORDED} strokeWidth={2} />
              ))}
              {lane.simulatedEdges.map((edge, k) => (
                <path key={`s${k}`} d={`M ${x(edge.t)} ${mid + 4} v 12`} stroke={SIMULATED} strokeWidth={2} />
              ))}
            </g>
          );
        })}
        <g transform={`translate(0 ${lanes.length * LANE_H})`}>
          <line x1={LABEL_W} x2={width - 20} y1={4} y2={4} stroke="#3b4754" />
          {ticks.map((s) => (
            <g key={s}>
              <line x1={x(s)} x2={x(s)} y1={4} y2={8} stroke="#3b4754" />
              <text x={x(s)} y={20} textAnchor="middle" className="fill-ink-soft text-[10px]">
                {s}
              </text>
            </g>
          ))}
          <text x={6} y={20} className="fill-ink-soft text-[10px]">
            time, s
          </text>
        </g>
        {divergence ? (
          <g data-testid="edge-divergence">
            <line x1={x(divergence.t)} x2={x(divergence.t)} y1={0} y2={lanes.length * LANE_H} stroke={DIVERGED} strokeDasharray="4 3" strokeWidth={1.5} />
            <text x={x(divergence.t) + 4} y={10} className="fill-danger text-[10px]">
              first divergence {divergence.t.toFixed(3)} s
            </text>
          </g>
        ) : null}
        <line x1={x(t)} x2={x(t)} y1={0} y2={lanes.length * LANE_H} stroke="#1d4ed8" strokeWidth={1} />
      </svg>
      <figcaption className="flex flex-wrap gap-3 px-2 py-1 text-xs text-ink-soft">
        <span>
          <span className="mr-1 inline-block h-3 w-0.5 align-middle" style={{ background: RECORDED }} />
          recorded on the machine (above)
        </span>
        <span>
          <span className="mr-1 inline-block h-3 w-0.5 align-middle" style={{ background: SIMULATED }} />
          the model (below)
        </span>
        <span>joined: the same edge, labelled model − machine in ms; red beyond 50 ms or missing</span>
      </figcaption>
    </figure>
  );
}

function formatMs(ms: number): string {
  return `${ms > 0 ? '+' : ''}${Math.round(ms)} ms`;
}

function formatRms(word: string, si: number): string {
  return word.startsWith('pressure:') ? `${(si / 1e5).toFixed(2)} bar` : `${(si * 1000).toFixed(1)} mm`;
}

/** Round-number ticks, about eight along the axis. */
function axisTicks(durationS: number): number[] {
  const raw = durationS / 8;
  const step = [0.1, 0.2, 0.5, 1, 2, 5, 10, 20, 30, 60].find((s) => s >= raw) ?? 60;
  const ticks: number[] = [];
  for (let s = 0; s <= durationS + 1e-9; s += step) ticks.push(Number(s.toFixed(3)));
  return ticks;
}
