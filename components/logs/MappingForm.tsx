'use client';

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { ApiError } from '@/components/api/api-error';
import { FormAlert } from '@/components/forms/FormAlert';
import { Button } from '@/components/ui/Button';
import { useCan } from '@/components/workspace/use-current-workspace';
import type { CircuitDocument } from '@/engine/document/schema';
import { ruleVocabulary } from '@/engine/proof/rules';
import { columnMappingSchema, LOG_UNITS, type ColumnMapping, type LogUnit, type MappedColumn } from '@/lib/field-logs';
import { kindOfWord } from '@/lib/field-logs/mapping';
import { logKeys, saveMapping, type UploadDetail } from './logs-api';

const UNIT_LABEL: Record<LogUnit, string> = {
  'bar-gauge': 'bar (gauge)',
  'bar-absolute': 'bar (absolute)',
  'kPa-gauge': 'kPa (gauge)',
  'Pa-absolute': 'Pa (absolute)',
  'psi-gauge': 'psi (gauge)',
  mm: 'mm',
  m: 'm',
};

/** What a column may record of a part: its state words, the pressure at each of its ports, and a cylinder's position. */
function wordsOf(entry: { words: string[]; ports: string[]; type: string } | undefined): string[] {
  if (!entry) return [];
  return [...entry.words, ...entry.ports.map((p) => `pressure:${p}`), ...(entry.type.startsWith('cylinder') ? ['position'] : [])];
}

/**
 * Which column is the time, and what every other column records: a part of the drawing, what of
 * it, whether it drove the machine (a command the replay gives the model) or was observed (to be
 * compared), and the unit of a measured value. Starts from a saved mapping, a suggestion from the
 * column names, or what was saved for this log; the server checks the whole file against it.
 */
export function MappingForm({ log, document, onSaved }: { log: UploadDetail; document: CircuitDocument; onSaved: () => void }) {
  const queryClient = useQueryClient();
  const canEdit = useCan('replay:run');
  const preview = log.preview!;
  const vocabulary = useMemo(() => ruleVocabulary(document), [document]);
  const byTag = useMemo(() => new Map(vocabulary.map((v) => [v.tag, v])), [vocabulary]);
  // The server sends the mappings saved for the circuit's other logs with the same columns.
  const fitting = log.reusableMappings;
  const [mapping, setMapping] = useState<ColumnMapping>(() => log.mapping?.mapping ?? withEveryColumn(preview.suggestedMapping, preview.columns));
  const [name, setName] = useState(log.mapping?.name ?? log.fileName.replace(/\.[^.]+$/, ''));
  const checked = columnMappingSchema.safeParse(mapping);
  const problemAt = (index: number, field: keyof MappedColumn) =>
    checked.success ? null : (checked.error.issues.find((i) => i.path[0] === 'columns' && i.path[1] === index && i.path[2] === field)?.message ?? null);

  const save = useMutation({
    mutationFn: () => saveMapping(log.id, { name: name.trim(), mapping, revision: log.mapping?.revision ?? 0 }),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: logKeys.log(log.id) });
      onSaved();
    },
  });

  const setColumn = (index: number, patch: Partial<MappedColumn>) =>
    setMapping((m) => ({ ...m, columns: m.columns.map((c, i) => (i === index ? normalised({ ...c, ...patch }) : c)) }));

  return (
    <div className="space-y-3" data-testid="mapping-form">
      <p className="text-sm text-ink-soft">
        {preview.format === 'csv' ? `CSV, separated by ${preview.separator === '\t' ? 'tabs' : `“${preview.separator}”`}${preview.decimalComma ? ', decimal comma' : ''}` : 'JSON lines'} · {preview.rowCount.toLocaleString('en-GB')} rows.
        Commands drive the model; observations are compared with it.
      </p>
      {fitting.length ? (
        <label className="block text-sm">
          Start from a saved mapping
          <select
            className="mt-1 block h-9 w-full rounded-md border border-rule bg-paper-raised px-2"
            defaultValue=""
            onChange={(e) => {
              const picked = fitting.find((m) => m.id === e.target.value);
              if (picked) setMapping(withEveryColumn(picked.mapping, preview.columns));
            }}
            data-testid="mapping-saved"
          >
            <option value="">choose…</option>
            {fitting.map((m) => (
              <option key={m.id} value={m.id}>
                {m.name} (by {m.updatedBy.name})
              </option>
            ))}
          </select>
        </label>
      ) : null}
      <div className="flex flex-wrap gap-3 text-sm">
        <label>
          Time column
          <select value={mapping.time.column} onChange={(e) => setMapping((m) => ({ ...m, time: { ...m.time, column: e.target.value } }))} className="mt-1 block h-9 rounded-md border border-rule bg-paper-raised px-2" data-testid="mapping-time-column">
            {preview.columns.map((c) => (
              <option key={c}>{c}</option>
            ))}
          </select>
        </label>
        <label>
          Written as
          <select
            value={mapping.time.format}
            onChange={(e) => setMapping((m) => ({ ...m, time: { ...m.time, format: e.target.value as ColumnMapping['time']['format'] } }))}
            className="mt-1 block h-9 rounded-md border border-rule bg-paper-raised px-2"
            data-testid="mapping-time-format"
          >
            <option value="seconds">seconds</option>
            <option value="milliseconds">milliseconds</option>
            <option value="iso8601">date and time (ISO 8601)</option>
          </select>
        </label>
      </div>
      <div className="overflow-x-auto">
        <table className="w-full min-w-[36rem] text-sm" data-testid="mapping-table">
          <thead className="text-left text-xs text-ink-soft">
            <tr>
              <th className="py-1 pr-2">Column</th>
              <th className="py-1 pr-2">First values</th>
              <th className="py-1 pr-2">Role</th>
              <th className="py-1 pr-2">Part</th>
              <th className="py-1 pr-2">Records</th>
              <th className="py-1">Unit</th>
            </tr>
          </thead>
          <tbody>
            {mapping.columns.map((c, i) => {
              const at = preview.columns.indexOf(c.column);
              const samples = preview.rows.slice(0, 3).map((r) => r[at] ?? '').join(' · ');
              const words = wordsOf(byTag.get(c.tag));
              const number = c.word !== '' && kindOfWord(c.word) === 'number';
              const ignored = c.role === 'ignore';
              return (
                <tr key={c.column} className="border-t border-rule align-top" data-testid="mapping-row" data-column={c.column}>
                  <td className="py-1 pr-2 font-mono">{c.column}</td>
                  <td className="value py-1 pr-2 text-xs text-ink-soft">{samples}</td>
                  <td className="py-1 pr-2">
                    <select value={c.role} onChange={(e) => setColumn(i, { role: e.target.value as MappedColumn['role'] })} aria-label={`Role of ${c.column}`} aria-invalid={problemAt(i, 'role') !== null} className="h-8 rounded border border-rule bg-paper-raised px-1" data-testid="mapping-role">
                      <option value="command">command</option>
                      <option value="observation">observation</option>
                      <option value="ignore">ignore</option>
                    </select>
                    <FieldProblem text={problemAt(i, 'role')} />
                  </td>
                  <td className="py-1 pr-2">
                    <select value={c.tag} disabled={ignored} onChange={(e) => setColumn(i, { tag: e.target.value, word: wordsOf(byTag.get(e.target.value))[0] ?? '' })} aria-label={`Part ${c.column} records`} aria-invalid={problemAt(i, 'tag') !== null} className="h-8 rounded border border-rule bg-paper-raised px-1" data-testid="mapping-tag">
                      <option value="">—</option>
                      {vocabulary.map((v) => (
                        <option key={v.tag} value={v.tag}>
                          {v.tag}
                        </option>
                      ))}
                    </select>
                    <FieldProblem text={problemAt(i, 'tag')} />
                  </td>
                  <td className="py-1 pr-2">
                    <select value={c.word} disabled={ignored || c.tag === ''} onChange={(e) => setColumn(i, { word: e.target.value })} aria-label={`What ${c.column} records`} aria-invalid={problemAt(i, 'word') !== null} className="h-8 rounded border border-rule bg-paper-raised px-1" data-testid="mapping-word">
                      <option value="">—</option>
                      {words.map((w) => (
                        <option key={w} value={w}>
                          {w.startsWith('pressure:') ? `pressure at port ${w.slice(9)}` : w}
                        </option>
                      ))}
                    </select>
                    <FieldProblem text={problemAt(i, 'word')} />
                  </td>
                  <td className="py-1">
                    {number && !ignored ? (
                      <select value={c.unit ?? ''} onChange={(e) => setColumn(i, { unit: (e.target.value || undefined) as LogUnit | undefined })} aria-label={`Unit of ${c.column}`} aria-invalid={problemAt(i, 'unit') !== null} className="h-8 rounded border border-rule bg-paper-raised px-1" data-testid="mapping-unit">
                        <option value="">SI as stored</option>
                        {LOG_UNITS.map((u) => (
                          <option key={u} value={u}>
                            {UNIT_LABEL[u]}
                          </option>
                        ))}
                      </select>
                    ) : (
                      <span className="text-xs text-ink-faint">{ignored ? '' : 'on/off'}</span>
                    )}
                    <FieldProblem text={problemAt(i, 'unit')} />
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <label className="block text-sm">
        Save the mapping as
        <input value={name} onChange={(e) => setName(e.target.value)} className="mt-1 block h-9 w-full rounded-md border border-rule bg-paper-raised px-2" data-testid="mapping-name" />
      </label>
      {save.error ? <FormAlert tone="error">{save.error instanceof ApiError && save.error.field ? `${save.error.field}: ${save.error.message}` : save.error.message}</FormAlert> : null}
      {canEdit ? (
        <Button onClick={() => save.mutate()} disabled={!checked.success || name.trim() === '' || save.isPending} data-testid="mapping-save">
          {save.isPending ? 'Checking the whole log…' : 'Save the mapping'}
        </Button>
      ) : null}
    </div>
  );
}

function FieldProblem({ text }: { text: string | null }) {
  return text ? <span className="block max-w-[14rem] text-xs text-danger">{text}</span> : null;
}

/** A state word takes no unit; a measured value keeps its unit. */
function normalised(column: MappedColumn): MappedColumn {
  return column.word !== '' && kindOfWord(column.word) === 'state' ? { ...column, unit: undefined } : column;
}

/** A row for every column of the log but the time, in the log's order; columns the mapping leaves out are ignored. */
function withEveryColumn(mapping: ColumnMapping, columns: readonly string[]): ColumnMapping {
  return {
    time: mapping.time,
    columns: columns.filter((c) => c !== mapping.time.column).map((column) => mapping.columns.find((c) => c.column === column) ?? { column, tag: '', word: '', role: 'ignore' as const }),
  };
}
