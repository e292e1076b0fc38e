'use client';

import { useState } from 'react';
import type { Diagnostic } from '@/engine/solver/model';
import { countOf } from '@/components/ui/count';

/**
 * What the engine finds wrong or doubtful in the drawing, listed under the canvas. Picking a
 * finding selects the component, tube or wire it is about.
 */
export function ChecksPanel({ checks, onPick }: { checks: readonly Diagnostic[]; onPick: (check: Diagnostic) => void }) {
  const [open, setOpen] = useState(false);
  const errors = checks.filter((c) => c.severity === 'error').length;
  const warnings = checks.length - errors;
  const summary = checks.length === 0 ? 'No findings' : [errors ? countOf(errors, 'error') : null, warnings ? countOf(warnings, 'warning') : null].filter(Boolean).join(' · ');

  return (
    <section aria-label="Checks" className="border-t border-rule" data-testid="checks">
      <button
        type="button"
        onClick={() => setOpen((o) => !o)}
        aria-expanded={open}
        disabled={checks.length === 0}
        className="flex w-full items-center gap-2 px-3 py-1.5 text-left text-sm disabled:cursor-default"
        data-testid="checks-toggle"
      >
        <span className="font-medium text-ink">Checks</span>
        <span className={errors ? 'text-danger' : warnings ? 'text-caution' : 'text-ink-soft'} data-testid="checks-summary">
          {summary}
        </span>
        {checks.length ? <span className="ml-auto text-xs text-ink-soft">{open ? 'Hide' : 'Show'}</span> : null}
      </button>
      {open && checks.length ? (
        <ul className="max-h-40 overflow-y-auto border-t border-rule text-sm">
          {checks.map((check, i) => (
            <li key={`${check.code}-${i}`}>
              <button
                type="button"
                onClick={() => onPick(check)}
                className="flex w-full gap-2 px-3 py-1 text-left hover:bg-paper-sunk"
                data-testid="check-item"
              >
                <span className={`w-14 shrink-0 text-xs font-semibold uppercase ${check.severity === 'error' ? 'text-danger' : 'text-caution'}`}>{check.severity}</span>
                <span className="text-ink">{check.message}</span>
              </button>
            </li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}
