'use client';

import { useMemo, useState } from 'react';
import { Button } from '@/components/ui/Button';
import type { CircuitDocument } from '@/engine/document/schema';
import { faultsFor, faultTypeById, type FaultCandidate, type FaultSpec } from '@/engine/faults';

/** Where a new fault starts: halfway from healthy to the worse end of its range (the end farther from healthy). */
export function startingSeverity(candidate: FaultCandidate, onOff: boolean): number {
  if (onOff) return 1;
  const { min, max, healthy } = candidate.severity;
  const worse = Math.abs(max - healthy) >= Math.abs(healthy - min) ? max : min;
  return healthy + (worse - healthy) / 2;
}

const keyOf = (f: { faultId: string; tag: string }) => `${f.faultId}|${f.tag}`;

/**
 * Faults put into the live run by hand, to see what they do on this very machine (training
 * commissioning staff, trying a suspicion): pick a part and what goes wrong with it, set how bad.
 * The drawing keeps its parameters; only the run sees the fault, and the run starts again with
 * every change.
 */
export function FaultPanel({ document, faults, onChange }: { document: CircuitDocument; faults: readonly FaultSpec[]; onChange: (faults: FaultSpec[]) => void }) {
  const candidates = useMemo(() => faultsFor(document), [document]);
  const free = candidates.filter((c) => !faults.some((f) => keyOf(f) === keyOf(c)));
  const [picked, setPicked] = useState('');
  const add = () => {
    const candidate = candidates.find((c) => keyOf(c) === picked);
    if (!candidate) return;
    const type = faultTypeById(candidate.faultId)!;
    onChange([...faults, { faultId: candidate.faultId, tag: candidate.tag, severity: startingSeverity(candidate, type.onOff) }]);
    setPicked('');
  };
  const setSeverity = (index: number, severity: number) => onChange(faults.map((f, i) => (i === index ? { ...f, severity } : f)));

  return (
    <section className="space-y-2 border-b border-rule bg-caution-soft/40 px-3 py-2 text-sm" aria-label="Injected faults" data-testid="fault-panel">
      <p className="text-xs text-ink-soft">Faults injected here change only the run, not the drawing. The run starts again whenever they change; a run with faults cannot be saved.</p>
      {faults.length === 0 ? <p className="text-ink-soft">No fault injected.</p> : null}
      <ul className="space-y-2">
        {faults.map((f, i) => {
          const type = faultTypeById(f.faultId);
          const range = candidates.find((c) => keyOf(c) === keyOf(f))?.severity;
          if (!type || !range) return null;
          return (
            <li key={keyOf(f)} className="flex flex-wrap items-center gap-2" data-testid="fault-item">
              <span className="min-w-[14rem] flex-1 text-ink" data-testid="fault-description">
                {type.describe(f.tag, f.severity)}
              </span>
              {type.onOff ? null : (
                <input
                  type="range"
                  min={range.min}
                  max={range.max}
                  step={(range.max - range.min) / 100}
                  value={f.severity}
                  onChange={(e) => setSeverity(i, Number(e.target.value))}
                  aria-label={`${range.label} of ${type.label} on ${f.tag}`}
                  className="w-40"
                  data-testid="fault-severity"
                />
              )}
              <Button size="sm" variant="quiet" onClick={() => onChange(faults.filter((_, j) => j !== i))}>
                Remove
              </Button>
            </li>
          );
        })}
      </ul>
      {free.length ? (
        <div className="flex flex-wrap items-center gap-2">
          <label className="flex items-center gap-1 text-ink-soft">
            Add
            <select value={picked} onChange={(e) => setPicked(e.target.value)} className="h-8 max-w-[20rem] rounded-md border border-rule bg-paper-raised px-1 text-sm text-ink" data-testid="fault-pick">
              <option value="">a fault on a part…</option>
              {free.map((c) => (
                <option key={keyOf(c)} value={keyOf(c)}>
                  {c.label}
                </option>
              ))}
            </select>
          </label>
          <Button size="sm" variant="secondary" onClick={add} disabled={picked === ''} data-testid="fault-add">
            Inject
          </Button>
        </div>
      ) : null}
    </section>
  );
}
