'use client';

import type { ReactNode } from 'react';
import { Button } from '@/components/ui/Button';
import type { Alignment, DistributionAxis } from './document-commands';

const SHORTCUTS: ReadonlyArray<readonly [string, string]> = [
  ['Ctrl+Z', 'Undo'],
  ['Ctrl+Shift+Z, Ctrl+Y', 'Redo'],
  ['Delete, Backspace', 'Remove the selection'],
  ['Ctrl+D', 'Duplicate the selected parts'],
  ['Ctrl+C, Ctrl+V', 'Copy the selected parts, paste them'],
  ['R, Shift+R', 'Turn the selected parts clockwise, anticlockwise'],
  ['F', 'Flip the selected parts left to right'],
  ['Shift+click', 'Add to the selection'],
  ['Drag on empty canvas', 'Select with a frame'],
  ['Right or middle drag, wheel', 'Pan'],
  ['Ctrl+wheel, pinch', 'Zoom'],
  ['Drag port to port', 'Join with a tube or wire'],
  ['Drag a square on a selected tube or wire', 'Move a run or a bend'],
  ['Double-click a tube or wire, a bend', 'Add a bend, remove it'],
  ['During a run: Shift+click a button', 'Keep it pressed'],
];

const LINE_UPS: ReadonlyArray<readonly [Alignment, string]> = [
  ['left', 'Left edges'],
  ['centre', 'Centres, one above another'],
  ['right', 'Right edges'],
  ['top', 'Top edges'],
  ['middle', 'Middles, side by side'],
  ['bottom', 'Bottom edges'],
];

const SPREADS: ReadonlyArray<readonly [DistributionAxis, string]> = [
  ['horizontal', 'Evenly, left to right'],
  ['vertical', 'Evenly, top to bottom'],
];

interface EditorToolbarProps {
  title: string;
  /** Under the revision number: where the circuit's review stands, and the way to its history. */
  status?: ReactNode;
  revisionNumber: number;
  unsaved: boolean;
  canEdit: boolean;
  canUndo: boolean;
  canRedo: boolean;
  hasSelection: boolean;
  paletteOpen: boolean;
  detailsOpen: boolean;
  onUndo: () => void;
  onRedo: () => void;
  onDelete: () => void;
  onDuplicate: () => void;
  canDuplicate: boolean;
  /** How many parts (not tubes or wires) are selected: turning needs one, aligning two, spreading three. */
  partsSelected: number;
  onTurn: () => void;
  onFlip: () => void;
  onAlign: (how: Alignment) => void;
  onDistribute: (axis: DistributionAxis) => void;
  onFit: () => void;
  onSave: () => void;
  onTogglePalette: () => void;
  onToggleDetails: () => void;
}

/** Title, revision state and the drawing commands. Keyboard: Ctrl+Z undo, Ctrl+Shift+Z or Ctrl+Y redo, Delete removes, R turns, F flips. */
export function EditorToolbar(props: EditorToolbarProps) {
  const { title, revisionNumber, unsaved, canEdit } = props;
  return (
    <div className="flex flex-wrap items-center gap-2 border-b border-rule px-3 py-2">
      <div className="mr-auto min-w-0">
        <h1 className="truncate text-base" data-testid="circuit-title">
          {title}
        </h1>
        <p className="text-xs text-ink-soft" data-testid="revision-state">
          Revision <span className="value">{revisionNumber}</span>
          {unsaved ? <span className="ml-1 text-caution">· unsaved changes</span> : null}
        </p>
        {props.status}
      </div>
      {canEdit ? (
        <>
          <Button size="sm" variant="quiet" className="md:hidden" onClick={props.onTogglePalette} aria-expanded={props.paletteOpen} data-testid="toggle-palette">
            Parts
          </Button>
          <Button size="sm" variant="quiet" onClick={props.onUndo} disabled={!props.canUndo} title="Undo (Ctrl+Z)" data-testid="undo">
            Undo
          </Button>
          <Button size="sm" variant="quiet" onClick={props.onRedo} disabled={!props.canRedo} title="Redo (Ctrl+Shift+Z)" data-testid="redo">
            Redo
          </Button>
          <Button size="sm" variant="quiet" onClick={props.onDuplicate} disabled={!props.canDuplicate} title="Duplicate the selected parts (Ctrl+D)" data-testid="duplicate">
            Duplicate
          </Button>
          <Button size="sm" variant="quiet" onClick={props.onDelete} disabled={!props.hasSelection} title="Remove the selection (Delete)" data-testid="delete">
            Remove
          </Button>
          <Button size="sm" variant="quiet" onClick={props.onTurn} disabled={props.partsSelected === 0} title="Turn the selected parts a quarter turn clockwise (R; Shift+R turns back)" data-testid="turn-selection">
            Turn
          </Button>
          <Button size="sm" variant="quiet" onClick={props.onFlip} disabled={props.partsSelected === 0} title="Flip the selected parts left to right (F)" data-testid="flip-selection">
            Flip
          </Button>
          <select
            // Always shows its prompt: picking an entry applies it once, like a button.
            value=""
            onChange={(e) => {
              const [kind, what] = e.target.value.split(':');
              if (kind === 'align') props.onAlign(what as Alignment);
              else if (kind === 'spread') props.onDistribute(what as DistributionAxis);
            }}
            disabled={props.partsSelected < 2}
            aria-label="Align the selected parts"
            title="Line up the selected parts, or space them evenly"
            className="h-8 rounded-md border border-rule bg-paper-raised px-1 text-sm text-ink-soft disabled:cursor-not-allowed disabled:opacity-60"
            data-testid="align-selection"
          >
            <option value="" disabled>
              Align…
            </option>
            <optgroup label="Line up">
              {LINE_UPS.map(([how, label]) => (
                <option key={how} value={`align:${how}`}>
                  {label}
                </option>
              ))}
            </optgroup>
            <optgroup label="Space out (three or more)">
              {SPREADS.map(([axis, label]) => (
                <option key={axis} value={`spread:${axis}`} disabled={props.partsSelected < 3}>
                  {label}
                </option>
              ))}
            </optgroup>
          </select>
        </>
      ) : null}
      <Button size="sm" variant="quiet" className="lg:hidden" onClick={props.onToggleDetails} aria-expanded={props.detailsOpen} data-testid="toggle-details">
        Details
      </Button>
      <Button size="sm" variant="quiet" onClick={props.onFit} title="Show the whole drawing" data-testid="fit">
        Fit
      </Button>
      <details className="relative" data-testid="keys-help">
        <summary className="flex h-8 cursor-pointer list-none items-center rounded-md px-3 text-sm font-medium text-ink-soft hover:bg-paper-sunk hover:text-ink">
          Keys
        </summary>
        <dl className="absolute right-0 z-20 mt-1 grid w-72 grid-cols-[auto_1fr] gap-x-3 gap-y-1 rounded-md border border-rule bg-paper-raised p-3 text-xs text-ink shadow-lg">
          {SHORTCUTS.map(([keys, what]) => (
            <div key={keys} className="contents">
              <dt>
                <kbd>{keys}</kbd>
              </dt>
              <dd className="text-ink-soft">{what}</dd>
            </div>
          ))}
        </dl>
      </details>
      {canEdit ? (
        <Button size="sm" variant="primary" onClick={props.onSave} disabled={!unsaved} data-testid="save-revision">
          Save revision
        </Button>
      ) : null}
    </div>
  );
}
