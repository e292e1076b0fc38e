import { applyPatches, enablePatches, produceWithPatches, type Patch } from 'immer';
import { createStore } from 'zustand/vanilla';
import type { CircuitDocument } from '@/engine/document/schema';
import { moveComponents, type ItemSelection } from './document-commands';

enablePatches();

/** One undoable change: what it was called and the document patches both ways. */
interface HistoryEntry {
  label: string;
  patches: Patch[];
  inverse: Patch[];
}

export const NOTHING_SELECTED: ItemSelection = { components: [], tubes: [], wires: [] };

export interface EditorState {
  /** The circuit document: the one source of truth the canvas draws. */
  document: CircuitDocument;
  selection: ItemSelection;
  past: HistoryEntry[];
  future: HistoryEntry[];
  /** Counts document changes (edits, undo, redo) since the document was loaded or saved. */
  changesSinceSave: number;
  /** Positions before the drag in progress, or null: a whole drag is one undo step. */
  dragBase: CircuitDocument | null;

  /** Applies a document edit as one undo step named `label` (an edit that changes nothing leaves no step). */
  edit<T>(label: string, recipe: (draft: CircuitDocument) => T): T;
  undo(): void;
  redo(): void;
  /** Drag in progress: moves without history. */
  dragTo(moves: ReadonlyArray<{ id: string; x: number; y: number }>): void;
  /** Drag finished: the moves since the drag began become one undo step. */
  endDrag(): void;
  select(selection: ItemSelection): void;
  /** A freshly loaded document (or the one just saved): history starts over. */
  load(document: CircuitDocument): void;
  markSaved(): void;
}

export type EditorStore = ReturnType<typeof createEditorStore>;

/**
 * The editor's state: the document with undo and redo kept as immer patches (a drag is one
 * step; selection and viewport never enter the history).
 */
export function createEditorStore(initial: CircuitDocument) {
  return createStore<EditorState>()((set, get) => ({
    document: initial,
    selection: NOTHING_SELECTED,
    past: [],
    future: [],
    changesSinceSave: 0,
    dragBase: null,

    edit(label, recipe) {
      let result!: ReturnType<typeof recipe>;
      const [document, patches, inverse] = produceWithPatches(get().document, (draft) => {
        result = recipe(draft as CircuitDocument);
      });
      if (patches.length === 0) return result;
      set((s) => ({ document, past: [...s.past, { label, patches, inverse }], future: [], changesSinceSave: s.changesSinceSave + 1 }));
      return result;
    },

    undo() {
      const { past, document } = get();
      const entry = past.at(-1);
      if (!entry) return;
      set((s) => ({
        document: applyPatches(document, entry.inverse),
        past: past.slice(0, -1),
        future: [entry, ...s.future],
        changesSinceSave: s.changesSinceSave + 1,
        selection: NOTHING_SELECTED,
      }));
    },

    redo() {
      const { future, document } = get();
      const entry = future[0];
      if (!entry) return;
      set((s) => ({
        document: applyPatches(document, entry.patches),
        past: [...s.past, entry],
        future: future.slice(1),
        changesSinceSave: s.changesSinceSave + 1,
        selection: NOTHING_SELECTED,
      }));
    },

    dragTo(moves) {
      const { document, dragBase } = get();
      const [next] = produceWithPatches(document, (draft) => moveComponents(draft as CircuitDocument, moves));
      set({ document: next, dragBase: dragBase ?? document });
    },

    endDrag() {
      const { dragBase, document } = get();
      if (!dragBase) return;
      // Replay the final positions on the document as it was before the drag: one entry for the whole drag.
      const moved = document.components.filter((c) => {
        const before = dragBase.components.find((b) => b.id === c.id);
        return before && (before.position.x !== c.position.x || before.position.y !== c.position.y);
      });
      const [, patches, inverse] = produceWithPatches(dragBase, (draft) =>
        moveComponents(draft as CircuitDocument, moved.map((c) => ({ id: c.id, ...c.position }))),
      );
      set((s) =>
        patches.length === 0
          ? { dragBase: null }
          : { dragBase: null, past: [...s.past, { label: 'Move', patches, inverse }], future: [], changesSinceSave: s.changesSinceSave + 1 },
      );
    },

    select(selection) {
      set({ selection });
    },

    load(document) {
      set({ document, selection: NOTHING_SELECTED, past: [], future: [], changesSinceSave: 0, dragBase: null });
    },

    markSaved() {
      set({ changesSinceSave: 0 });
    },
  }));
}
