import type { ObservedSequence, SequenceActuator, SequenceStep } from '@/engine/proof/sequence';
import { seconds } from './sequence-text';

/** Drawing grid, px: the label column, one step, one actuator row and the margin above the end-position lines. */
const LABEL_W = 168;
const STEP_W = 72;
const ROW_H = 64;
const INSET = 14;
const HEAD_H = 40;
const FOOT_H = 48;
const RIGHT = 20;

/**
 * The displacement-step diagram of one run (after VDI 3260 practice): a row per actuator between
 * its retracted (0) and extended (1) ends, a column per observed step, motions as slanted lines
 * across the step in which they happened, and the time of every step boundary underneath.
 * Drawn at a fixed scale: on a narrow screen the box scrolls sideways rather than squeezing it.
 */
export function DisplacementStepDiagram({ sequence }: { sequence: ObservedSequence }) {
  const steps = sequence.steps.filter((s) => s.index > 0);
  const { actuators } = sequence;
  if (!actuators.length || !steps.length) {
    return (
      <p className="text-sm text-ink-soft" data-testid="step-diagram-empty">
        {actuators.length ? 'No actuator moved in this run, so there are no steps to draw.' : 'This circuit has no cylinder or semi-rotary actuator to draw.'}
      </p>
    );
  }
  const width = LABEL_W + steps.length * STEP_W + RIGHT;
  const height = HEAD_H + actuators.length * ROW_H + FOOT_H;
  const xAt = (boundary: number) => LABEL_W + boundary * STEP_W;
  const bodyBottom = HEAD_H + actuators.length * ROW_H;
  const boundaries = [steps[0]!.startS, ...steps.map((s) => s.endS)];

  return (
    <figure className="rounded-md border border-rule bg-paper-raised p-2 shadow-sm print:break-inside-avoid print:border-black print:shadow-none" data-testid="step-diagram">
      <figcaption className="px-1 pb-1 text-sm font-medium text-ink print:text-black">Displacement-step diagram, as observed in this run</figcaption>
      <div className="overflow-x-auto print:overflow-visible">
        <svg
          width={width}
          height={height}
          viewBox={`0 0 ${width} ${height}`}
          role="img"
          aria-label={`Displacement-step diagram: ${actuators.length} actuator rows over ${steps.length} steps`}
          className="block font-sans text-ink print:text-black"
        >
          <text x={LABEL_W - 8} y={14} textAnchor="end" className="fill-ink-soft text-[11px] print:fill-black">
            step
          </text>
          {steps.map((step, k) => (
            <text key={step.index} x={xAt(k) + STEP_W / 2} y={14} textAnchor="middle" className="value fill-ink text-[12px] font-semibold print:fill-black" data-testid="step-diagram-step">
              {step.index}
            </text>
          ))}
          {boundaries.map((_, k) => (
            <line key={k} x1={xAt(k)} x2={xAt(k)} y1={HEAD_H - 12} y2={bodyBottom + 6} className="stroke-rule print:stroke-black" strokeWidth={1} strokeDasharray={k === 0 || k === steps.length ? undefined : '3 3'} />
          ))}
          {actuators.map((actuator, row) => (
            <Row key={actuator.componentId} actuator={actuator} steps={steps} row={row} xAt={xAt} width={width} />
          ))}
          <Signals actuators={actuators} steps={steps} xAt={xAt} />
          <text x={LABEL_W - 28} y={bodyBottom + 20} textAnchor="end" className="fill-ink-soft text-[11px] print:fill-black">
            time, s
          </text>
          {boundaries.map((t, k) => (
            <text key={k} x={xAt(k)} y={bodyBottom + 20 + (k % 2) * 14} textAnchor="middle" className="value fill-ink-soft text-[10px] print:fill-black" data-testid="step-diagram-time">
              {seconds(t)}
            </text>
          ))}
        </svg>
      </div>
    </figure>
  );
}

/** Height in the drawing of a level (0 retracted … 1 extended) in a row. */
function levelY(row: number, level: number): number {
  return HEAD_H + row * ROW_H + INSET + (1 - level) * (ROW_H - 2 * INSET);
}

/** An actuator's level at each step boundary of the drawn steps. */
function boundaryLevels(actuator: SequenceActuator, steps: SequenceStep[]): number[] {
  const levels = [actuator.initialLevel];
  for (const step of steps) levels.push(step.motions.find((m) => m.componentId === actuator.componentId)?.toLevel ?? levels[levels.length - 1]!);
  return levels;
}

/**
 * Signal lines: from what opened a step to the motion it started. An arrival comes from its own
 * row; an input, sensor or timer comes down from above the rows, named by its tag.
 */
function Signals({ actuators, steps, xAt }: { actuators: SequenceActuator[]; steps: SequenceStep[]; xAt: (b: number) => number }) {
  return (
    <g data-part="signals">
      {steps.map((step, k) => {
        const started = step.motions.find((m) => m.from !== 'mid');
        if (!step.cause || !started) return null;
        const x = xAt(k);
        const target = actuators.findIndex((a) => a.componentId === started.componentId);
        const source = actuators.findIndex((a) => a.componentId === step.cause!.componentId);
        if (source === target) return null;
        const yTo = levelY(target, started.fromLevel);
        const yFrom = source >= 0 ? levelY(source, boundaryLevels(actuators[source]!, steps)[k]!) : HEAD_H - 6;
        const head = yFrom < yTo ? -6 : 6;
        return (
          <g key={step.index} data-testid="step-diagram-signal" data-from={step.cause.tag} data-to={started.tag}>
            <title>{`Step ${step.index} began after: ${step.trigger ?? ''}`}</title>
            <line x1={x} x2={x} y1={yFrom} y2={yTo} className="stroke-ink-soft print:stroke-black" strokeWidth={1} />
            <polygon points={`${x},${yTo} ${x - 3},${yTo + head} ${x + 3},${yTo + head}`} className="fill-ink-soft print:fill-black" />
            {source < 0 ? (
              <text x={x + 3} y={HEAD_H - 10} className="value fill-ink-soft text-[9px] print:fill-black">
                {step.cause.tag}
              </text>
            ) : (
              <circle cx={x} cy={yFrom} r={2.5} className="fill-ink-soft print:fill-black" />
            )}
          </g>
        );
      })}
    </g>
  );
}

function Row({ actuator, steps, row, xAt, width }: { actuator: SequenceActuator; steps: SequenceStep[]; row: number; xAt: (b: number) => number; width: number }) {
  const top = HEAD_H + row * ROW_H;
  const yAt = (level: number) => levelY(row, level);
  let level = actuator.initialLevel;
  const points = [`${xAt(0)},${yAt(level)}`];
  steps.forEach((step, k) => {
    const motion = step.motions.find((m) => m.componentId === actuator.componentId);
    if (motion) points.push(`${xAt(k)},${yAt(motion.fromLevel)}`);
    level = motion ? motion.toLevel : level;
    points.push(`${xAt(k + 1)},${yAt(level)}`);
  });
  return (
    <g data-testid="step-diagram-row" data-tag={actuator.tag}>
      <line x1={0} x2={width} y1={top + ROW_H} y2={top + ROW_H} className="stroke-rule print:stroke-black" strokeWidth={0.5} />
      <text x={4} y={top + ROW_H / 2 - 2} className="value fill-ink text-[13px] font-semibold print:fill-black">
        {actuator.tag}
      </text>
      <text x={4} y={top + ROW_H / 2 + 12} className="fill-ink-soft text-[10px] print:fill-black">
        {actuator.label.length > 16 ? `${actuator.label.slice(0, 15)}…` : actuator.label}
      </text>
      <text x={LABEL_W - 8} y={yAt(1) + 3} textAnchor="end" className="fill-ink-soft text-[10px] print:fill-black">
        extended 1
      </text>
      <text x={LABEL_W - 8} y={yAt(0) + 3} textAnchor="end" className="fill-ink-soft text-[10px] print:fill-black">
        retracted 0
      </text>
      {[0, 1].map((end) => (
        <line key={end} x1={xAt(0)} x2={xAt(steps.length)} y1={yAt(end)} y2={yAt(end)} className="stroke-rule print:stroke-black" strokeWidth={0.75} strokeDasharray="1 3" />
      ))}
      <polyline points={points.join(' ')} fill="none" className="stroke-accent-strong print:stroke-black" strokeWidth={2.5} strokeLinejoin="round" />
    </g>
  );
}
