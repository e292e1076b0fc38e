import type { ObservedSequence } from '@/engine/proof/sequence';
import { SafetyNote } from '@/components/shell/SafetyNote';
import { motionText, restText, seconds } from './sequence-text';

/**
 * The run as a GRAFCET-style list (IEC 60848 words): each step with the transition observed to
 * open it and the actions seen during it. It records what happened in one simulation; it is not
 * a controller program and says so.
 */
export function StepList({ sequence }: { sequence: ObservedSequence }) {
  return (
    <section className="space-y-2 rounded-md border border-rule bg-paper-raised p-3 shadow-sm print:break-inside-avoid print:border-black print:shadow-none" data-testid="step-list">
      <h3 className="text-sm">Steps observed in this run</h3>
      <p className="text-xs text-ink-soft print:text-black">
        What the simulation went through, step by step: each transition is the input, sensor, timer or end position seen just before the step began. It describes this run only — it is not a
        controller program and does not show what other input timings would do.
      </p>
      <div className="overflow-x-auto print:overflow-visible">
        <table className="w-full min-w-[20rem] text-sm">
          <thead className="text-left text-xs text-ink-soft print:text-black">
            <tr>
              <th scope="col" className="py-1 pr-2">
                Step
              </th>
              <th scope="col" className="py-1 pr-2">
                Transition into it (observed)
              </th>
              <th scope="col" className="py-1 pr-2">
                Actions
              </th>
              <th scope="col" className="py-1 pr-2 text-right">
                Start, s
              </th>
              <th scope="col" className="py-1 text-right">
                End, s
              </th>
            </tr>
          </thead>
          <tbody>
            {sequence.steps.map((step) => (
              <tr key={step.index} className="border-t border-rule align-top print:border-black" data-testid="step-list-row" data-step={step.index}>
                <th scope="row" className="value py-1 pr-2 text-left font-semibold text-ink">
                  {step.index}
                  {step.index === 0 ? <span className="block font-sans text-xs font-normal text-ink-soft print:text-black">initial</span> : null}
                </th>
                <td className="py-1 pr-2 text-ink">{step.index === 0 ? 'start of the run' : (step.trigger ?? <span className="text-ink-soft">nothing observed</span>)}</td>
                <td className="py-1 pr-2 text-ink">
                  {step.index === 0 ? (
                    sequence.actuators.map(restText).join(', ') || 'no actuators'
                  ) : step.motions.length ? (
                    <ul>
                      {step.motions.map((m) => (
                        <li key={m.componentId}>{motionText(m)}</li>
                      ))}
                    </ul>
                  ) : (
                    <span className="text-ink-soft">none: every actuator rests</span>
                  )}
                </td>
                <td className="value py-1 pr-2 text-right text-ink-soft print:text-black">{seconds(step.startS)}</td>
                <td className="value py-1 text-right text-ink-soft print:text-black">{seconds(step.endS)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <SafetyNote className="text-xs print:border-black print:bg-transparent" />
    </section>
  );
}
