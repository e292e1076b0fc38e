'use client';

import { Button } from '@/components/ui/Button';

const SHORTCUTS: ReadonlyArray<readonly [string, string]> = [
  ['Ctrl+Z', 'Undo'],
  ['Ctrl+Shift+Z, Ctrl+Y', 'Redo'],
  ['Delete, Backspace', 'Remove the selection'],
  ['Ctrl+D', 'Duplicate the selected parts'],
  ['Ctrl+C, Ctrl+V', 'Copy the selected parts, paste them'],
  ['Shift+click', 'Add to the selection'],
  ['Drag on empty canvas', 'Select with a frame'],
  ['Right or middle drag, wheel', 'Pan'],
  ['Ctrl+wheel, pinch', 'Zoom'],
  ['Drag port to port', 'Join with a tube or wire'],
];

interface EditorToolbarProps {
  title: string;
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
  onFit: () => void;
  onSave: () => void;
  onTogglePalette: () => void;
  onToggleDetails: () => void;
}

/** Title, revision state and the drawing commands. Keyboard: Ctrl+Z undo, Ctrl+Shift+Z or Ctrl+Y redo, Delete removes. */
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
