'use client';

import { useQuery } from '@tanstack/react-query';
import { useCallback, useMemo, useState } from 'react';
import { requestJson } from '@/components/api/request-json';
import { circuitKey } from '@/components/editor/CircuitEditorPage';
import type { RunFrame } from '@/components/editor/run/run-frame';
import { FormAlert } from '@/components/forms/FormAlert';
import { RevisionDrawing } from '@/components/review/RevisionDrawing';
import { TabList } from '@/components/ui/TabList';
import { TextLink } from '@/components/ui/TextLink';
import { circuitDocumentSchema } from '@/engine/document/schema';
import type { CircuitDetail } from '@/lib/circuits/get-circuit';
import { fetchRules, proofKeys } from './proof-api';
import type { ReplayTarget } from './replay-target';
import { RulesPanel } from './RulesPanel';
import { RunReplay } from './RunReplay';
import { ScenariosPanel } from './ScenariosPanel';
import { SearchPanel } from './SearchPanel';

type Tab = 'rules' | 'scenarios' | 'search' | 'replay';

/**
 * Rules and proofs of a circuit's newest revision: the rules it must keep, the scenarios that
 * exercise it, the exhaustive timing search, and a replay of any saved scenario run or
 * counterexample on the drawing.
 */
export function ProofsPage({ circuitId, proofId: initialProof }: { circuitId: string; proofId?: string }) {
  const circuit = useQuery({ queryKey: circuitKey(circuitId), queryFn: ({ signal }) => requestJson<CircuitDetail>(`/api/circuits/${circuitId}`, signal) });
  const rules = useQuery({ queryKey: proofKeys.rules(circuitId), queryFn: ({ signal }) => fetchRules(circuitId, signal) });
  const [tab, setTab] = useState<Tab>(initialProof ? 'search' : 'rules');
  const [proofId, setProofId] = useState<string | null>(initialProof ?? null);
  const [target, setTarget] = useState<ReplayTarget | null>(null);
  const [frame, setFrame] = useState<RunFrame | null>(null);
  const [draft, setDraft] = useState<string | null>(null);
  const parsed = useMemo(() => (circuit.data?.revision ? circuitDocumentSchema.safeParse(circuit.data.revision.document) : null), [circuit.data]);

  const replay = useCallback((next: ReplayTarget) => {
    setTarget(next);
    setTab('replay');
  }, []);
  const closeReplay = useCallback(() => {
    setTarget(null);
    setFrame(null);
    setTab('search');
  }, []);

  if (circuit.isError) return <FormAlert tone="error">{circuit.error.message}</FormAlert>;
  if (!circuit.data) return <p className="text-sm text-ink-soft">Loading the circuit…</p>;
  if (!circuit.data.revision) return <FormAlert tone="error">This circuit has no saved revision yet: save the drawing first.</FormAlert>;
  if (parsed && !parsed.success) return <FormAlert tone="error">This revision&rsquo;s drawing could not be read: {parsed.error.issues[0]?.message}</FormAlert>;
  const document = parsed!.data!;
  const revisionNumber = circuit.data.revision.number;
  const tabs: Array<{ id: Tab; label: string }> = [
    { id: 'rules', label: 'Rules' },
    { id: 'scenarios', label: 'Scenarios' },
    { id: 'search', label: 'Timing search' },
    ...(target ? [{ id: 'replay' as const, label: 'Replay' }] : []),
  ];

  return (
    <div className="flex flex-col gap-3 lg:h-[calc(100dvh-9rem)]" data-testid="proofs-page">
      <header className="flex flex-wrap items-end justify-between gap-3">
        <div className="min-w-0">
          <p className="text-sm text-ink-soft">
            <TextLink href={`/circuits/${circuitId}`}>{circuit.data.title}</TextLink> · <TextLink href={`/circuits/${circuitId}/history`}>Revisions</TextLink>
          </p>
          <h1 className="text-xl">Rules and proofs</h1>
          <p className="text-xs text-ink-soft">Revision {revisionNumber}, the newest: scenarios and searches run on it and are kept with it.</p>
        </div>
      </header>
      <div className="flex min-h-0 flex-1 flex-col gap-3 lg:flex-row">
        {/* A set height on narrow screens: the drawing fills its box, and a box without a height has none to fill. */}
        <div className="h-[24rem] min-w-0 overflow-hidden rounded-lg border border-rule bg-paper-raised lg:h-auto lg:flex-1">
          <RevisionDrawing document={document} frame={frame} />
        </div>
        <aside className="flex min-h-0 flex-col gap-2 lg:w-[30rem] lg:shrink-0">
          <TabList tabs={tabs} current={tab} onPick={setTab} label="Rules and proofs" testIdPrefix="proofs-tab" />
          <div className="min-h-0 flex-1 space-y-3 overflow-y-auto pr-1">
            <div hidden={tab !== 'rules'}>
              <RulesPanel circuitId={circuitId} document={document} onDraft={setDraft} />
            </div>
            {tab === 'scenarios' ? <ScenariosPanel circuitId={circuitId} document={document} onReplay={replay} /> : null}
            {tab === 'search' ? (
              <SearchPanel
                circuitId={circuitId}
                document={document}
                revisionNumber={revisionNumber}
                savedRules={rules.data?.text ?? ''}
                rulesDraftDiffers={draft !== null && draft !== (rules.data?.text ?? '')}
                proofId={proofId}
                onProofId={setProofId}
                onReplay={replay}
              />
            ) : null}
            {tab === 'replay' && target ? <RunReplay key={target.runId} circuitId={circuitId} target={target} document={document} onFrame={setFrame} onClose={closeReplay} /> : null}
          </div>
        </aside>
      </div>
    </div>
  );
}
