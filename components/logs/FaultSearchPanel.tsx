'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { FormAlert } from '@/components/forms/FormAlert';
import { Button } from '@/components/ui/Button';
import { isJobActive, JOB_POLL_MS, JOB_STATUS_LABEL, timeToGo } from '@/components/ui/job-status';
import { ProgressMeter } from '@/components/ui/ProgressMeter';
import { useCan } from '@/components/workspace/use-current-workspace';
import { faultTypeById } from '@/engine/faults';
import { cancelFaultSearch, fetchFaultSearch, fetchFaultSearches, logKeys, startFaultSearch, type UploadDetail } from './logs-api';

/** Percentage points of match a fault must add to the healthy drawing's to be listed as an explanation. */
const MEANINGFUL_GAIN = 1;

/**
 * The fault search: every fault the drawing could have, each fitted to the log over its severity
 * range (a coarse pass, then closer around the best), ranked by how much better it explains the
 * log than the healthy drawing. Worked as a job; the page shows progress and can stop it.
 */
export function FaultSearchPanel({ log }: { log: UploadDetail }) {
  const queryClient = useQueryClient();
  const canRun = useCan('replay:run');
  const searches = useQuery({ queryKey: logKeys.searches(log.id), queryFn: ({ signal }) => fetchFaultSearches(log.id, signal) });
  const [picked, setPicked] = useState<string | null>(null);
  const start = useMutation({
    mutationFn: () => startFaultSearch(log.id),
    onSuccess: ({ id }) => {
      setPicked(id);
      void queryClient.invalidateQueries({ queryKey: logKeys.searches(log.id) });
    },
  });
  const shown = picked ?? searches.data?.items[0]?.id ?? null;
  return (
    <div className="space-y-3" data-testid="fault-search-panel">
      <p className="text-sm text-ink-soft">
        Tries each fault the drawing could have — seal leaks, tube leaks, throttles set differently, weak springs, sticking or stuck spools, moved or failed sensors, low supply, clogged
        silencers — fits how bad it would have to be, and ranks them by how well they explain the log. A ranked fault is a place to look on the machine, not a diagnosis.
      </p>
      {log.mapping === null ? <p className="text-sm text-ink-soft">Save a mapping of the columns first.</p> : null}
      {canRun && log.mapping ? (
        <Button onClick={() => start.mutate()} disabled={start.isPending} data-testid="fault-search-start">
          {start.isPending ? 'Starting…' : 'Search for the faults behind this log'}
        </Button>
      ) : null}
      {start.error ? <FormAlert tone="error">{start.error.message}</FormAlert> : null}
      {shown ? <SearchView key={shown} searchId={shown} logId={log.id} /> : null}
    </div>
  );
}

function SearchView({ searchId, logId }: { searchId: string; logId: string }) {
  const queryClient = useQueryClient();
  const canRun = useCan('replay:run');
  const search = useQuery({
    queryKey: logKeys.search(searchId),
    queryFn: ({ signal }) => fetchFaultSearch(searchId, signal),
    refetchInterval: (query) => (query.state.data && !isJobActive(query.state.data.status) ? false : JOB_POLL_MS),
  });
  const cancel = useMutation({
    mutationFn: () => cancelFaultSearch(searchId),
    onSuccess: (detail) => {
      queryClient.setQueryData(logKeys.search(searchId), detail);
      void queryClient.invalidateQueries({ queryKey: logKeys.searches(logId) });
    },
  });
  if (search.isError) return <FormAlert tone="error">{search.error.message}</FormAlert>;
  if (!search.data) return <p className="text-sm text-ink-soft">Loading the search…</p>;
  const s = search.data;
  const active = isJobActive(s.status);
  // A fault that leaves the match where the healthy drawing has it explains nothing: it is counted, not listed.
  const explaining = s.result ? s.result.candidates.filter((c) => c.match >= s.result!.baseline.match + MEANINGFUL_GAIN) : [];
  const progress = s.progress;
  return (
    <section className="space-y-2 rounded-md border border-rule bg-paper-raised p-3" aria-live="polite" data-testid="fault-search">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 className="text-sm font-medium">
          Fault search on revision {s.revisionNumber} · <span data-testid="fault-search-status">{JOB_STATUS_LABEL[s.status]}</span>
        </h3>
        {active && canRun ? (
          <Button size="sm" variant="secondary" onClick={() => cancel.mutate()} disabled={cancel.isPending} data-testid="fault-search-cancel">
            Stop the search
          </Button>
        ) : null}
      </div>
      {progress ? (
        <ProgressMeter done={progress.done} total={progress.total} label="Simulations run" testId="fault-search-progress">
          {progress.done} of about {progress.total} simulations · {progress.elapsedS.toFixed(1)} s elapsed{timeToGo(progress.estimateS, s.status)}
        </ProgressMeter>
      ) : active ? (
        <p className="text-sm text-ink-soft">Waiting for a worker to take the search…</p>
      ) : null}
      {s.error ? <FormAlert tone="error">{s.error}</FormAlert> : null}
      {cancel.error ? <FormAlert tone="error">{cancel.error.message}</FormAlert> : null}
      {s.result ? (
        <div className="space-y-2">
          <p className="text-sm" data-testid="fault-search-baseline">
            The drawing as it is matches the log {s.result.baseline.match.toFixed(0)} %. {s.result.complete ? '' : 'The search was stopped: not every fault was fitted.'} {s.result.evaluated} simulations.
          </p>
          <div className="overflow-x-auto">
            <table className="w-full min-w-[32rem] text-sm" data-testid="fault-ranking">
              <thead className="text-left text-xs text-ink-soft">
                <tr>
                  <th className="py-1 pr-2">#</th>
                  <th className="py-1 pr-2">Fault</th>
                  <th className="py-1 pr-2">Fitted</th>
                  <th className="py-1 pr-2">Match</th>
                  <th className="py-1">Why</th>
                </tr>
              </thead>
              <tbody>
                {explaining.slice(0, 12).map((c, i) => (
                  <tr key={`${c.faultId}|${c.tag}`} className="border-t border-rule align-top" data-testid="fault-candidate">
                    <td className="value py-1 pr-2">{i + 1}</td>
                    <td className="py-1 pr-2 font-medium text-ink">{c.label}</td>
                    <td className="py-1 pr-2 text-xs">{faultTypeById(c.faultId)?.describe(c.tag, c.severity) ?? `${c.severity} ${c.severityUnit}`}</td>
                    <td className="value py-1 pr-2">{c.match.toFixed(0)} %</td>
                    <td className="py-1 text-xs text-ink-soft">{c.explanation}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          {s.result.candidates.length > explaining.length ? (
            <p className="text-xs text-ink-soft" data-testid="fault-search-rest">
              {s.result.candidates.length - explaining.length} other {s.result.candidates.length - explaining.length === 1 ? 'fault explains' : 'faults explain'} the log no better than the drawing as it is.
            </p>
          ) : null}
        </div>
      ) : null}
    </section>
  );
}
