'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { requestJson } from '@/components/api/request-json';
import { ChangeTime } from '@/components/circuits/ChangeTime';
import { circuitKey } from '@/components/editor/CircuitEditorPage';
import type { RunFrame } from '@/components/editor/run/run-frame';
import { FormAlert } from '@/components/forms/FormAlert';
import { RevisionDrawing } from '@/components/review/RevisionDrawing';
import { Button } from '@/components/ui/Button';
import { Pagination } from '@/components/ui/Pagination';
import { TabList } from '@/components/ui/TabList';
import { TextLink } from '@/components/ui/TextLink';
import { useCan } from '@/components/workspace/use-current-workspace';
import { circuitDocumentSchema, type CircuitDocument } from '@/engine/document/schema';
import type { CircuitDetail } from '@/lib/circuits/get-circuit';
import { FaultSearchPanel } from './FaultSearchPanel';
import { deleteLog, fetchLog, fetchLogs, logFileUrl, logKeys, type UploadSummary } from './logs-api';
import { MappingForm } from './MappingForm';
import { ReplayView } from './ReplayView';
import { UploadZone } from './UploadZone';

type Tab = 'columns' | 'replay' | 'faults';
type SortKey = 'createdAt' | 'fileName' | 'sizeBytes';

/** Bytes as a person reads them. */
function sizeText(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(1)} KiB`;
  return `${(bytes / 1024 / 1024).toFixed(1)} MiB`;
}

/**
 * Field logs of a circuit: upload one from the machine, say what its columns record, replay it on
 * the drawing against what the machine did, and search for the faults that would explain the
 * difference.
 */
export function LogsPage({ circuitId }: { circuitId: string }) {
  const queryClient = useQueryClient();
  const circuit = useQuery({ queryKey: circuitKey(circuitId), queryFn: ({ signal }) => requestJson<CircuitDetail>(`/api/circuits/${circuitId}`, signal) });
  const [page, setPage] = useState(1);
  const logs = useQuery({ queryKey: logKeys.logs(circuitId, page), queryFn: ({ signal }) => fetchLogs(circuitId, page, signal) });
  const [openId, setOpenId] = useState<string | null>(null);
  const [frame, setFrame] = useState<RunFrame | null>(null);
  const document = useMemo(() => {
    const parsed = circuit.data?.revision ? circuitDocumentSchema.safeParse(circuit.data.revision.document) : null;
    return parsed?.success ? parsed.data : null;
  }, [circuit.data]);
  const canUpload = useCan('upload:create');
  const opened = openId ?? logs.data?.items[0]?.id ?? null;

  if (circuit.isError) return <FormAlert tone="error">{circuit.error.message}</FormAlert>;
  if (!circuit.data) return <p className="text-sm text-ink-soft">Loading the circuit…</p>;
  if (!document) return <FormAlert tone="error">This circuit has no readable saved revision: save the drawing first.</FormAlert>;

  return (
    <div className="space-y-4" data-testid="logs-page">
      <header>
        <p className="text-sm text-ink-soft">
          <TextLink href={`/circuits/${circuitId}`}>{circuit.data.title}</TextLink> · <TextLink href={`/circuits/${circuitId}/proofs`}>Rules and proofs</TextLink>
        </p>
        <h1 className="text-xl">Field logs</h1>
        <p className="text-xs text-ink-soft">Replays and fault searches run on the newest revision, {circuit.data.revision!.number}.</p>
      </header>
      <div className="grid gap-4 lg:grid-cols-[22rem_1fr]">
        <section className="space-y-3">
          {canUpload ? (
            <UploadZone
              circuitId={circuitId}
              onUploaded={(upload) => {
                setOpenId(upload.id);
                setPage(1);
                void queryClient.invalidateQueries({ queryKey: logKeys.allLogs(circuitId) });
              }}
            />
          ) : null}
          {logs.isError ? <FormAlert tone="error">{logs.error.message}</FormAlert> : null}
          {logs.data ? <LogTable items={logs.data.items} opened={opened} onOpen={setOpenId} circuitId={circuitId} /> : null}
          {logs.data && logs.data.total > logs.data.pageSize ? (
            <Pagination page={page} pageCount={Math.ceil(logs.data.total / logs.data.pageSize)} onPageChange={setPage} busy={logs.isFetching} label="Field logs" />
          ) : null}
        </section>
        <section className="min-w-0 space-y-3">
          <div className="h-[22rem] overflow-hidden rounded-lg border border-rule bg-paper-raised">
            <RevisionDrawing document={document} frame={frame} />
          </div>
          {opened ? <OpenedLog key={opened} logId={opened} document={document} onFrame={setFrame} /> : <p className="text-sm text-ink-soft">Upload a log to begin.</p>}
        </section>
      </div>
    </div>
  );
}

function LogTable({ items, opened, onOpen, circuitId }: { items: UploadSummary[]; opened: string | null; onOpen: (id: string) => void; circuitId: string }) {
  const queryClient = useQueryClient();
  const [sort, setSort] = useState<{ key: SortKey; down: boolean }>({ key: 'createdAt', down: true });
  const remove = useMutation({
    mutationFn: (id: string) => deleteLog(id),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: logKeys.allLogs(circuitId) }),
  });
  if (items.length === 0) return <p className="text-sm text-ink-soft">No log has been uploaded for this circuit.</p>;
  const sorted = [...items].sort((a, b) => {
    const order = sort.key === 'sizeBytes' ? a.sizeBytes - b.sizeBytes : a[sort.key].localeCompare(b[sort.key]);
    return sort.down ? -order : order;
  });
  const header = (key: SortKey, label: string) => (
    <th className="py-1 pr-2" aria-sort={sort.key === key ? (sort.down ? 'descending' : 'ascending') : 'none'}>
      <button type="button" className="font-medium hover:text-ink" onClick={() => setSort((s) => ({ key, down: s.key === key ? !s.down : key !== 'fileName' }))} data-testid={`logs-sort-${key}`}>
        {label}
        {sort.key === key ? (sort.down ? ' ↓' : ' ↑') : ''}
      </button>
    </th>
  );
  return (
    <div className="overflow-x-auto">
      {remove.error ? <FormAlert tone="error">{remove.error.message}</FormAlert> : null}
      <table className="w-full text-sm" data-testid="logs-table">
        <thead className="text-left text-xs text-ink-soft">
          <tr>
            {header('fileName', 'File')}
            {header('sizeBytes', 'Size')}
            {header('createdAt', 'Uploaded')}
          </tr>
        </thead>
        <tbody>
          {sorted.map((u) => (
            <tr key={u.id} className={`border-t border-rule align-top ${u.id === opened ? 'bg-accent-soft/50' : ''}`} data-testid="logs-row">
              <td className="py-1 pr-2">
                <button type="button" className="text-left font-medium text-accent-strong underline" onClick={() => onOpen(u.id)} data-testid="logs-open">
                  {u.fileName}
                </button>
                <span className="block font-mono text-[10px] text-ink-faint" title={`SHA-256 ${u.sha256}`}>
                  SHA-256 {u.sha256.slice(0, 12)}…
                </span>
              </td>
              <td className="value py-1 pr-2">{sizeText(u.sizeBytes)}</td>
              <td className="py-1 pr-2 text-xs">
                {u.uploadedBy.name}, <ChangeTime iso={u.createdAt} />
                <span className="mt-0.5 flex gap-2">
                  <a href={logFileUrl(u.id)} className="text-accent-strong underline" download>
                    Download
                  </a>
                  <Button size="sm" variant="quiet" onClick={() => window.confirm(`Delete ${u.fileName} with its replays and searches?`) && remove.mutate(u.id)}>
                    Delete
                  </Button>
                </span>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function OpenedLog({ logId, document, onFrame }: { logId: string; document: CircuitDocument; onFrame: (frame: RunFrame | null) => void }) {
  const log = useQuery({ queryKey: logKeys.log(logId), queryFn: ({ signal }) => fetchLog(logId, signal) });
  const [tab, setTab] = useState<Tab | null>(null);
  if (log.isError) return <FormAlert tone="error">{log.error.message}</FormAlert>;
  if (!log.data) return <p className="text-sm text-ink-soft">Reading the log…</p>;
  const detail = log.data;
  const current: Tab = tab ?? (detail.mapping ? 'replay' : 'columns');
  return (
    <div className="space-y-3" data-testid="log-detail">
      <h2 className="text-lg">{detail.fileName}</h2>
      {detail.parseErrors ? (
        <FormAlert tone="error">
          This file could not be read as a log:
          <ul className="mt-1 list-disc pl-5" data-testid="log-parse-errors">
            {detail.parseErrors.map((e, i) => (
              <li key={i}>
                line {e.row}
                {e.column ? `, column ${e.column}` : ''}: {e.message}
              </li>
            ))}
          </ul>
        </FormAlert>
      ) : null}
      {detail.preview ? (
        <>
          <TabList
            tabs={[
              { id: 'columns' as const, label: 'Columns' },
              { id: 'replay' as const, label: 'Replay' },
              { id: 'faults' as const, label: 'Fault search' },
            ]}
            current={current}
            onPick={setTab}
            label="Field log"
            testIdPrefix="log-tab"
          />
          {current === 'columns' ? <MappingForm log={detail} document={document} onSaved={() => setTab('replay')} /> : null}
          {current === 'replay' ? <ReplayView log={detail} document={document} onFrame={onFrame} /> : null}
          {current === 'faults' ? <FaultSearchPanel log={detail} /> : null}
        </>
      ) : null}
    </div>
  );
}
