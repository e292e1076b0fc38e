'use client';

import type { CircuitDocument } from '@/engine/document/schema';
import { CircuitSettingsInspector } from './CircuitSettingsInspector';
import { ComponentInspector } from './ComponentInspector';
import type { ItemSelection } from './document-commands';
import type { DocumentEdit } from './inspector-commands';
import { TubeInspector } from './TubeInspector';

export interface InspectorProps {
  document: CircuitDocument;
  selection: ItemSelection;
  /** Shows the same fields, disabled. */
  readOnly: boolean;
  /** Applies a recipe to the document as one undo step: the editor store's `edit`. */
  onEdit: DocumentEdit;
}

/**
 * The side form for what is selected: one component's tag, label and parameters, one tube's
 * size, or with nothing selected the circuit's ambient conditions. Values are shown in the
 * editor's display units and stored in SI; each field change is one undo step.
 */
export function Inspector({ document, selection, readOnly, onEdit }: InspectorProps) {
  // Ids the document no longer has (a stale selection) are not counted.
  const components = document.components.filter((c) => selection.components.includes(c.id));
  const tubes = document.tubes.filter((t) => selection.tubes.includes(t.id));
  const wires = document.wires.filter((w) => selection.wires.includes(w.id));
  const count = components.length + tubes.length + wires.length;
  const tagOf = (componentId: string) => document.components.find((c) => c.id === componentId)?.tag ?? componentId;

  let body;
  if (count === 0) {
    body = <CircuitSettingsInspector settings={document.settings} readOnly={readOnly} onEdit={onEdit} />;
  } else if (count > 1) {
    body = (
      <>
        <h2 className="text-sm font-semibold text-ink" data-testid="inspector-count">
          {count} items selected
        </h2>
        <p className="mt-0.5 text-xs text-ink-soft">Select a single part or tube to see and change its settings.</p>
      </>
    );
  } else if (components[0]) {
    body = <ComponentInspector key={components[0].id} document={document} component={components[0]} readOnly={readOnly} onEdit={onEdit} />;
  } else if (tubes[0]) {
    body = <TubeInspector key={tubes[0].id} document={document} tube={tubes[0]} readOnly={readOnly} onEdit={onEdit} />;
  } else {
    const wire = wires[0]!;
    body = (
      <>
        <h2 className="text-sm font-semibold text-ink">Wire</h2>
        <p className="mt-0.5 text-xs text-ink-soft">
          From {tagOf(wire.from.component)} terminal {wire.from.port} to {tagOf(wire.to.component)} terminal {wire.to.port}. A wire has nothing to set.
        </p>
      </>
    );
  }

  return (
    <section aria-label="Inspector" className="h-full min-h-0 overflow-y-auto p-3" data-testid="inspector">
      {body}
    </section>
  );
}
