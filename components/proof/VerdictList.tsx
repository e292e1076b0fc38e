import type { RuleVerdict } from '@/engine/proof/rules';

/** Each rule checked on one run: held or broken, with the engine's sentence saying where or over what. */
export function VerdictList({ verdicts }: { verdicts: readonly RuleVerdict[] }) {
  return (
    <ul className="space-y-1 text-sm" data-testid="verdicts">
      {verdicts.map((v) => (
        <li key={`${v.line}:${v.name}`} className="flex gap-2">
          <span className={`shrink-0 rounded px-1.5 text-xs font-semibold leading-5 ${v.holds ? 'bg-accent-soft text-accent-strong' : 'bg-danger-soft text-danger'}`}>{v.holds ? 'held' : 'broken'}</span>
          <span>
            <span className="font-medium text-ink">{v.name}</span> <span className="text-ink-soft">— {v.explanation}</span>
          </span>
        </li>
      ))}
    </ul>
  );
}
