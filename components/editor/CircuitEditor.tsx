'use client';

import '@xyflow/react/dist/style.css';
import {
  Background,
  BackgroundVariant,
  ConnectionMode,
  Controls,
  MiniMap,
  ReactFlow,
  ReactFlowProvider,
  useReactFlow,
  type Connection,
  type EdgeChange,
  type NodeChange,
} from '@xyflow/react';
import { useCallback, useEffect, useMemo, useRef, useState, type DragEvent, type ReactNode } from 'react';
import { useStore } from 'zustand';
import type { CircuitDocument } from '@/engine/document/schema';
import { applyFaults, type FaultSpec } from '@/engine/faults';
import type { Diagnostic } from '@/engine/solver/model';
import { GRID, symbolGeometry } from '@/components/symbols/geometry';
import { saveRun } from '@/components/review/review-api';
import { useCan } from '@/components/workspace/use-current-workspace';
import { ChecksPanel } from './ChecksPanel';
import { PressureLegend } from './run/PressureLegend';
import { rampTopBar } from './run/pressure-ramp';
import { edgeInRun } from './run/run-edges';
import { FaultPanel } from './run/FaultPanel';
import { RunBar } from './run/RunBar';
import { RunContext, type RunView } from './run/run-context';
import { TracePlot } from './run/TracePlot';
import { Hands, handOperationOf } from './run/hands';
import { frameAt, prepareRun } from './run/run-frame';
import { useLiveRun } from './run/use-live-run';
import { CANVAS_EDGE_TYPES, CANVAS_NODE_TYPES } from './canvas-types';
import { memoizedChecks, problemsByItem } from './diagnostics';
import {
  addComponent,
  alignComponents,
  checkConnection,
  connect,
  distributeComponents,
  duplicateItems,
  mirrorComponents,
  removeItems,
  rotateComponents,
} from './document-commands';
import { EdgeEditingContext } from './edge-context';
import { createEditorStore, type EditorStore } from './editor-store';
import { EditorToolbar } from './EditorToolbar';
import { Inspector } from './Inspector';
import { edgesOf, nodesOf, type ComponentFlowNode, type ConnectionFlowEdge } from './flow-mapping';
import { clearDraft, readDraft, writeDraft } from './local-draft';
import { Palette, PALETTE_DRAG_TYPE } from './Palette';
import { SaveRevisionForm, type SavedRevision } from './SaveRevisionForm';
import { countOf } from '@/components/ui/count';


export interface EditorCircuit {
  id: string;
  title: string;
  lockVersion: number;
  revisionNumber: number;
  document: CircuitDocument;
}

/**
 * The circuit editor: palette, canvas and toolbar around one editor store. The canvas is a
 * controlled view of the document; every edit goes through the store, so undo covers it.
 * Without edit rights the same canvas is shown read-only.
 */
export function CircuitEditor({ circuit, canEdit, onReloadLatest, status }: { circuit: EditorCircuit; canEdit: boolean; onReloadLatest: () => void; status?: ReactNode }) {
  // A draft left by a reload of this same revision comes back (the editor mounts in the browser only, once the circuit has loaded).
  const [start] = useState(() => {
    const draft = canEdit && typeof window !== 'undefined' ? readDraft(window.localStorage, circuit.id, circuit.lockVersion) : null;
    const store = createEditorStore(draft?.document ?? circuit.document);
    if (draft) store.setState({ changesSinceSave: 1 });
    return { store, restoredAt: draft?.savedAt ?? null };
  });
  return (
    <ReactFlowProvider>
      <EditorFrame store={start.store} restoredFrom={start.restoredAt} circuit={circuit} canEdit={canEdit} onReloadLatest={onReloadLatest} status={status} />
    </ReactFlowProvider>
  );
}

function EditorFrame({
  store,
  restoredFrom,
  circuit,
  canEdit,
  onReloadLatest,
  status,
}: {
  status?: ReactNode;
  store: EditorStore;
  restoredFrom: string | null;
  circuit: EditorCircuit;
  canEdit: boolean;
  onReloadLatest: () => void;
}) {
  const document = useStore(store, (s) => s.document);
  const selection = useStore(store, (s) => s.selection);
  const changes = useStore(store, (s) => s.changesSinceSave);
  const canUndo = useStore(store, (s) => s.past.length > 0);
  const canRedo = useStore(store, (s) => s.future.length > 0);
  const flow = useReactFlow<ComponentFlowNode, ConnectionFlowEdge>();
  const canvasRef = useRef<HTMLDivElement>(null);
  const [saved, setSaved] = useState<{ lockVersion: number; number: number }>({ lockVersion: circuit.lockVersion, number: circuit.revisionNumber });
  const [saving, setSaving] = useState(false);
  const [notice, setNotice] = useState<string | null>(null);
  const [restoredAt, setRestoredAt] = useState<string | null>(restoredFrom);
  const [paletteOpen, setPaletteOpen] = useState(false);
  const [detailsOpen, setDetailsOpen] = useState(false);
  const [hovered, setHovered] = useState<string | null>(null);
  // The plot takes room from the drawing, so it opens on request.
  const [plotOpen, setPlotOpen] = useState(false);
  const [faults, setFaults] = useState<FaultSpec[]>([]);
  const [faultsOpen, setFaultsOpen] = useState(false);
  // Fit a drawing that has parts when it opens; an empty one starts at 100 % (fitting its first part would zoom far in).
  const [fitOnOpen] = useState(() => document.components.length > 0);

  useEffect(() => {
    if (!canEdit || changes === 0) return;
    writeDraft(window.localStorage, circuit.id, { baseLockVersion: saved.lockVersion, savedAt: new Date().toISOString(), document });
  }, [canEdit, changes, circuit.id, document, saved.lockVersion]);

  const [checksFor] = useState(memoizedChecks);
  const checks = checksFor(document);
  const problems = useMemo(() => problemsByItem(checks), [checks]);
  const run = useLiveRun();
  const running = run.status !== 'stopped';
  const editable = canEdit && !running;
  // The signal names stay the same through a run, so the columns each part reads are worked out once.
  const signalNames = run.trace?.names;
  const prepared = useMemo(() => (signalNames ? prepareRun(signalNames, document, run.flows) : null), [document, run.flows, signalNames]);
  const frame = useMemo(() => (running && prepared && run.trace ? frameAt(prepared, run.trace, run.t) : null), [prepared, run.t, run.trace, running]);
  const topBar = rampTopBar(frame?.highestBar ?? 0);
  const nodes = useMemo(() => nodesOf(document, selection, problems), [document, selection, problems]);
  const edges = useMemo(() => {
    const drawn = edgesOf(document, running ? { components: [], tubes: [], wires: [] } : selection, problems);
    if (!frame) return drawn;
    const readOut = (label: string) => ({ label, labelBgPadding: [4, 2] as [number, number], labelBgBorderRadius: 3 });
    return drawn.map((e) => {
      const styled = edgeInRun(e, frame, topBar);
      if (e.id !== hovered) return styled;
      if (e.data?.kind === 'wire') return { ...styled, ...readOut(frame.liveWires.has(e.id) ? 'live (+)' : 'no voltage') };
      const bar = frame.tubeBar.get(e.id);
      if (bar === undefined) return styled;
      // The tube under the pointer says its pressure, and how much air flows along it and which way.
      const flow = frame.tubeFlow.get(e.id);
      const tube = document.tubes.find((t) => t.id === e.id);
      const towards = tube && flow !== undefined ? document.components.find((c) => c.id === (flow >= 0 ? tube.to : tube.from).component)?.tag : undefined;
      const along = flow === undefined ? '' : ` · ${Math.abs(flow).toFixed(1)} l/min (ANR)${towards && Math.abs(flow) >= 0.05 ? ` → ${towards}` : ''}`;
      return { ...styled, ...readOut(`${bar.toFixed(2)} bar (gauge)${along}`) };
    });
  }, [document, frame, hovered, problems, running, selection, topBar]);

  const [hands] = useState(() => new Hands());
  const { act, status: runStatus } = run;
  const runView = useMemo<RunView>(
    () => ({
      running,
      states: frame?.components ?? new Map(),
      portBar: frame?.portBar ?? new Map(),
      portFlow: frame?.portFlow ?? new Map(),
      actuate: (componentId, phase, keep = false) => {
        const component = document.components.find((c) => c.id === componentId);
        const operation = component ? handOperationOf(component) : null;
        if (!operation || runStatus === 'ended' || runStatus === 'failed') return;
        const struck = frame?.components.get(componentId)?.state !== undefined;
        const input = hands.input(componentId, operation, phase, keep, struck);
        if (input) act(componentId, input);
      },
    }),
    [act, document.components, frame, hands, runStatus, running],
  );

  const pickCheck = useCallback(
    (check: Diagnostic) => {
      const { select } = store.getState();
      select({ components: check.componentId ? [check.componentId] : [], tubes: check.tubeId ? [check.tubeId] : [], wires: check.wireId ? [check.wireId] : [] });
      const focus = check.componentId ?? [check.tubeId, check.wireId].map((id) => [...document.tubes, ...document.wires].find((c) => c.id === id)?.from.component).find(Boolean);
      if (focus) void flow.fitView({ nodes: [{ id: focus }], padding: 1.2, maxZoom: 1.5, duration: 200 });
    },
    [document, flow, store],
  );

  const onNodesChange = useCallback(
    (changes: NodeChange<ComponentFlowNode>[]) => {
      const moves = changes.flatMap((c) => (c.type === 'position' && c.position && c.dragging ? [{ id: c.id, x: c.position.x, y: c.position.y }] : []));
      if (moves.length) store.getState().dragTo(moves);
      // During a run a click works the part instead of selecting it.
      const picks = running ? [] : changes.flatMap((c) => (c.type === 'select' ? [c] : []));
      if (picks.length === 0) return;
      const { selection: current, select } = store.getState();
      const components = new Set(current.components);
      for (const c of picks) {
        if (c.selected) components.add(c.id);
        else components.delete(c.id);
      }
      select({ ...current, components: [...components] });
    },
    [running, store],
  );

  const onEdgesChange = useCallback(
    (changes: EdgeChange<ConnectionFlowEdge>[]) => {
      const picks = running ? [] : changes.flatMap((c) => (c.type === 'select' ? [c] : []));
      if (picks.length === 0) return;
      const { selection: current, select, document: doc } = store.getState();
      const tubes = new Set(current.tubes);
      const wires = new Set(current.wires);
      for (const c of picks) {
        const list = doc.tubes.some((t) => t.id === c.id) ? tubes : wires;
        if (c.selected) list.add(c.id);
        else list.delete(c.id);
      }
      select({ components: current.components, tubes: [...tubes], wires: [...wires] });
    },
    [running, store],
  );

  const portsOf = (c: Connection | ConnectionFlowEdge) =>
    c.sourceHandle && c.targetHandle ? { a: { component: c.source, port: c.sourceHandle }, b: { component: c.target, port: c.targetHandle } } : null;

  const isValidConnection = useCallback(
    (c: Connection | ConnectionFlowEdge) => {
      const ends = portsOf(c);
      return ends !== null && checkConnection(store.getState().document, ends.a, ends.b).ok;
    },
    [store],
  );

  const onConnect = useCallback(
    (c: Connection) => {
      const ends = portsOf(c);
      if (!ends) return;
      const result = store.getState().edit('Connect', (d) => connect(d, ends.a, ends.b));
      setNotice(result.ok ? null : result.reason);
    },
    [store],
  );

  /** Parts copied with Ctrl+C: the document as it was then (immutable), and which of its parts. */
  const clipboard = useRef<{ source: CircuitDocument; ids: string[] } | null>(null);
  const pasteFrom = useCallback(
    (source: CircuitDocument, ids: readonly string[], label: string) => {
      if (ids.length === 0) return;
      const copies = store.getState().edit(label, (d) => duplicateItems(d, source, ids, { x: 2 * GRID, y: 2 * GRID }));
      store.getState().select({ components: copies, tubes: [], wires: [] });
    },
    [store],
  );
  const duplicateSelected = useCallback(() => {
    const { document: current, selection: picked } = store.getState();
    pasteFrom(current, picked.components, 'Duplicate');
  }, [pasteFrom, store]);

  const removeSelected = useCallback(() => {
    const { selection: picked } = store.getState();
    if (picked.components.length + picked.tubes.length + picked.wires.length === 0) return;
    store.getState().edit('Delete', (d) => removeItems(d, picked));
    store.getState().select({ components: [], tubes: [], wires: [] });
  }, [store]);

  const editSelectedParts = useCallback(
    (label: string, recipe: (draft: CircuitDocument, ids: readonly string[]) => void) => {
      const ids = store.getState().selection.components;
      if (ids.length) store.getState().edit(label, (d) => recipe(d, ids));
    },
    [store],
  );

  const addAt = useCallback(
    (typeId: string, centre: { x: number; y: number }) => {
      // The part lands centred on the point, on the grid.
      const { width, height } = symbolGeometry(typeId);
      const snapped = { x: Math.round((centre.x - width / 2) / GRID) * GRID, y: Math.round((centre.y - height / 2) / GRID) * GRID };
      const id = store.getState().edit('Add', (d) => addComponent(d, typeId, snapped));
      store.getState().select({ components: [id], tubes: [], wires: [] });
      setPaletteOpen(false);
    },
    [store],
  );

  const addAtCentre = useCallback(
    (typeId: string) => {
      const box = canvasRef.current?.getBoundingClientRect();
      const centre = box ? flow.screenToFlowPosition({ x: box.left + box.width / 2, y: box.top + box.height / 2 }) : { x: 0, y: 0 };
      addAt(typeId, centre);
    },
    [addAt, flow],
  );

  const onDrop = useCallback(
    (event: DragEvent) => {
      const typeId = event.dataTransfer.getData(PALETTE_DRAG_TYPE);
      if (!typeId || !canEdit) return;
      event.preventDefault();
      addAt(typeId, flow.screenToFlowPosition({ x: event.clientX, y: event.clientY }));
    },
    [addAt, canEdit, flow],
  );

  // Editing keys, except while typing in a field or during a run.
  useEffect(() => {
    if (!editable) return;
    const onKey = (event: KeyboardEvent) => {
      const target = event.target as HTMLElement | null;
      if (target?.closest('input, textarea, select, [contenteditable="true"]')) return;
      const key = event.key.toLowerCase();
      if (!(event.ctrlKey || event.metaKey)) {
        // A letter with Alt belongs to the browser or the system.
        if (event.altKey) return;
        if (key === 'r') editSelectedParts('Turn', (d, ids) => rotateComponents(d, ids, event.shiftKey ? -1 : 1));
        else if (key === 'f') editSelectedParts('Flip', mirrorComponents);
        else return;
        event.preventDefault();
        return;
      }
      if (key === 'z' && !event.shiftKey) store.getState().undo();
      else if ((key === 'z' && event.shiftKey) || key === 'y') store.getState().redo();
      else if (key === 'd') duplicateSelected();
      else if (key === 'c') {
        const { document: current, selection: picked } = store.getState();
        if (picked.components.length) clipboard.current = { source: current, ids: [...picked.components] };
      } else if (key === 'v' && clipboard.current) pasteFrom(clipboard.current.source, clipboard.current.ids, 'Paste');
      else return;
      event.preventDefault();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [duplicateSelected, editSelectedParts, editable, pasteFrom, store]);

  const onSaved = (revision: SavedRevision) => {
    setSaved({ lockVersion: revision.lockVersion, number: revision.number });
    store.getState().markSaved();
    clearDraft(window.localStorage, circuit.id);
    setRestoredAt(null);
    setSaving(false);
    setNotice(`Saved as revision ${revision.number}.`);
  };

  const [runSaveNote, setRunSaveNote] = useState<string | null>(null);
  const canSaveRun = useCan('circuit:run');
  // A saved run belongs to a saved revision: with unsaved changes the drawing being run is not one yet.
  const saveThisRun = () => {
    if (faults.length > 0) {
      setRunSaveNote('A run with injected faults is not kept: the revision it would belong to has no such faults.');
      return;
    }
    if (changes > 0) {
      setRunSaveNote('Save the revision first: a run is kept with a saved revision.');
      return;
    }
    const untilS = Math.max(run.intervalS, Math.round(run.t / run.intervalS) * run.intervalS);
    setRunSaveNote('Saving the run…');
    saveRun(circuit.id, { revisionNumber: saved.number, inputs: run.applied.current, untilS })
      .then(() => setRunSaveNote(`Run of ${untilS.toFixed(2)} s saved with revision ${saved.number}.`))
      .catch((error: unknown) => setRunSaveNote(error instanceof Error ? error.message : 'The run could not be saved.'));
  };

  const summary = [countOf(document.components.length, 'component'), countOf(document.tubes.length, 'tube'), countOf(document.wires.length, 'wire')].join(' · ');

  return (
    <div className="flex h-[calc(100dvh-11rem)] min-h-[28rem] flex-col overflow-hidden rounded-lg border border-rule bg-paper-raised" data-testid="circuit-editor">
      <EditorToolbar
        title={circuit.title}
        status={status}
        revisionNumber={saved.number}
        unsaved={changes > 0}
        canEdit={editable}
        canUndo={canUndo}
        canRedo={canRedo}
        hasSelection={selection.components.length + selection.tubes.length + selection.wires.length > 0}
        onUndo={() => store.getState().undo()}
        onRedo={() => store.getState().redo()}
        onDelete={removeSelected}
        onDuplicate={duplicateSelected}
        canDuplicate={selection.components.length > 0}
        partsSelected={selection.components.length}
        onTurn={() => editSelectedParts('Turn', (d, ids) => rotateComponents(d, ids, 1))}
        onFlip={() => editSelectedParts('Flip', mirrorComponents)}
        onAlign={(how) => editSelectedParts('Align', (d, ids) => alignComponents(d, ids, how))}
        onDistribute={(axis) => editSelectedParts('Space out', (d, ids) => distributeComponents(d, ids, axis))}
        onFit={() => void flow.fitView({ padding: 0.2, duration: 200 })}
        onSave={() => setSaving(true)}
        onTogglePalette={() => setPaletteOpen((open) => !open)}
        paletteOpen={paletteOpen}
        onToggleDetails={() => setDetailsOpen((open) => !open)}
        detailsOpen={detailsOpen}
      />
      <RunBar
        status={run.status}
        t={run.t}
        speed={run.speed}
        message={run.message}
        pace={run.pace}
        waiting={run.waiting}
        limitS={run.limitS}
        canRun={document.components.length > 0 && !checks.some((c) => c.severity === 'error')}
        onStart={() => {
          store.getState().select({ components: [], tubes: [], wires: [] });
          setRunSaveNote(null);
          run.start(faults.length ? applyFaults(document, faults) : document);
        }}
        onPause={run.pause}
        onResume={run.resume}
        onStop={() => {
          hands.clear();
          run.reset();
        }}
        onSpeed={run.changeSpeed}
        onStep={run.step}
        plotOpen={plotOpen}
        onTogglePlot={() => setPlotOpen((open) => !open)}
        onSaveRun={canSaveRun ? saveThisRun : undefined}
        saveNote={runSaveNote}
        faultCount={faults.length}
        faultsOpen={faultsOpen}
        onToggleFaults={() => setFaultsOpen((open) => !open)}
      />
      {faultsOpen ? (
        <FaultPanel
          document={document}
          faults={faults}
          onChange={(next) => {
            setFaults(next);
            // The run starts again with the faults as they now are.
            if (!running) return;
            hands.clear();
            run.reset();
            setRunSaveNote(null);
            run.start(next.length ? applyFaults(document, next) : document);
          }}
        />
      ) : null}
      {restoredAt ? (
        <div className="flex flex-wrap items-center gap-2 border-b border-rule bg-caution-soft px-3 py-1.5 text-sm text-ink" role="status" data-testid="draft-restored">
          Unsaved changes from {new Date(restoredAt).toLocaleString()} were restored.
          <button
            type="button"
            className="font-medium text-accent underline"
            onClick={() => {
              clearDraft(window.localStorage, circuit.id);
              store.getState().load(circuit.document);
              setRestoredAt(null);
            }}
          >
            Discard them
          </button>
        </div>
      ) : null}
      {saving ? (
        <SaveRevisionForm
          circuitId={circuit.id}
          document={document}
          expectedLockVersion={saved.lockVersion}
          onSaved={onSaved}
          onCancel={() => setSaving(false)}
          onReloadLatest={onReloadLatest}
        />
      ) : null}
      {notice ? (
        <p className="border-b border-rule px-3 py-1.5 text-sm text-ink-soft" role="status" data-testid="editor-notice">
          {notice}
        </p>
      ) : null}
      {!canEdit ? (
        <p className="border-b border-rule px-3 py-1.5 text-sm text-ink-soft" data-testid="read-only-note">
          Read-only: your role in this workspace can look at this circuit but not change it.
        </p>
      ) : null}
      <div className="relative flex min-h-0 flex-1">
        {editable ? (
          <aside
            className={`${paletteOpen ? 'absolute inset-y-0 left-0 z-10 flex shadow-lg' : 'hidden'} w-64 shrink-0 border-r border-rule bg-paper-raised md:relative md:flex md:shadow-none`}
            data-testid="palette"
          >
            <Palette onAdd={addAtCentre} />
          </aside>
        ) : null}
        <div ref={canvasRef} className="airproof-canvas relative min-w-0 flex-1" onDragOver={(e) => e.preventDefault()} onDrop={onDrop} data-testid="canvas">
          <RunContext.Provider value={runView}>
          <EdgeEditingContext.Provider value={editable ? store : null}>
          <ReactFlow<ComponentFlowNode, ConnectionFlowEdge>
            nodes={nodes}
            edges={edges}
            nodeTypes={CANVAS_NODE_TYPES}
            edgeTypes={CANVAS_EDGE_TYPES}
            onNodesChange={onNodesChange}
            onEdgesChange={onEdgesChange}
            onNodeDragStop={() => store.getState().endDrag()}
            onConnect={onConnect}
            onEdgeMouseEnter={(_, edge) => setHovered(edge.id)}
            onEdgeMouseLeave={() => setHovered(null)}
            isValidConnection={isValidConnection}
            onDelete={removeSelected}
            connectionMode={ConnectionMode.Loose}
            nodesDraggable={editable}
            nodesConnectable={editable}
            deleteKeyCode={editable ? ['Delete', 'Backspace'] : null}
            // During a run Shift belongs to the buttons on the drawing (keep pressed), not to selecting.
            multiSelectionKeyCode={running ? null : ['Shift', 'Meta', 'Control']}
            selectionKeyCode={running ? null : 'Shift'}
            selectionOnDrag={editable}
            panOnDrag={editable ? [1, 2] : true}
            panOnScroll
            snapToGrid
            snapGrid={[GRID, GRID]}
            fitView={fitOnOpen}
            fitViewOptions={{ padding: 0.2, maxZoom: 1.5 }}
            defaultViewport={{ x: 40, y: 40, zoom: 1 }}
            minZoom={0.2}
            maxZoom={4}
            proOptions={{ hideAttribution: true }}
          >
            <Background variant={BackgroundVariant.Dots} gap={GRID * 2} size={1} />
            <Controls showInteractive={false} position="bottom-right" />
            <MiniMap pannable zoomable position="top-right" style={{ width: 150, height: 100 }} className="!hidden sm:!block" ariaLabel="Overview of the drawing" />
          </ReactFlow>
          </EdgeEditingContext.Provider>
          </RunContext.Provider>
          {document.components.length === 0 ? (
            <div className="pointer-events-none absolute inset-0 flex items-center justify-center p-6 text-center text-sm text-ink-soft">
              {canEdit ? 'Empty drawing: pick a part from the list, or drag it here.' : 'This revision has no components yet.'}
            </div>
          ) : null}
        </div>
        <aside
          className={`${detailsOpen ? 'absolute inset-y-0 right-0 z-10 flex shadow-lg' : 'hidden'} w-72 shrink-0 border-l border-rule bg-paper-raised lg:relative lg:flex lg:shadow-none`}
          aria-label="Details of the selection"
          data-testid="details"
        >
          <Inspector document={document} selection={selection} readOnly={!editable} onEdit={store.getState().edit} />
        </aside>
      </div>
      {frame ? <PressureLegend topBar={topBar} wires={document.wires.length > 0} /> : null}
      {running && run.trace && plotOpen ? <TracePlot trace={run.trace} document={document} t={run.t} /> : null}
      <ChecksPanel checks={checks} onPick={pickCheck} />
      <footer className="flex flex-wrap items-center justify-between gap-2 border-t border-rule px-3 py-1.5 text-xs text-ink-soft">
        <span className="value" data-testid="editor-summary">{summary}</span>
        <span>Drawn to ISO 1219-1 semantics · port numbers per ISO 11727</span>
      </footer>
    </div>
  );
}
