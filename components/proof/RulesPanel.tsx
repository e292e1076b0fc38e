'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { ApiError } from '@/components/api/api-error';
import { FormAlert } from '@/components/forms/FormAlert';
import { Button } from '@/components/ui/Button';
import { useCan } from '@/components/workspace/use-current-workspace';
import type { CircuitDocument } from '@/engine/document/schema';
import { compileRulesText } from '@/engine/proof/rules';
import { fetchRules, proofKeys, saveRules, type RulesView } from './proof-api';
import { RulesEditor } from './RulesEditor';

/**
 * The circuit's rules: written in the editor, checked against the drawing as one types, started
 * from templates of safety practice, saved with a save count so two people cannot overwrite each
 * other's rules unknowingly.
 */
export function RulesPanel({ circuitId, document, onDraft }: { circuitId: string; document: CircuitDocument; onDraft: (text: string) => void }) {
  const rules = useQuery({ queryKey: proofKeys.rules(circuitId), queryFn: ({ signal }) => fetchRules(circuitId, signal) });
  if (rules.isError) return <FormAlert tone="error">{rules.error.message}</FormAlert>;
  if (!rules.data) return <p className="text-sm text-ink-soft">Loading the rules…</p>;
  // A new save count (ours or someone else's, after reloading) starts the draft again from what is stored.
  return <RulesForm key={rules.data.revision} circuitId={circuitId} document={document} saved={rules.data} onDraft={onDraft} />;
}

function RulesForm({ circuitId, document, saved, onDraft }: { circuitId: string; document: CircuitDocument; saved: RulesView; onDraft: (text: string) => void }) {
  const queryClient = useQueryClient();
  const canEdit = useCan('rules:edit');
  const [text, setText] = useState(saved.text);
  const [template, setTemplate] = useState('');
  const errors = useMemo(() => compileRulesText(text, document).errors, [text, document]);
  const ruleCount = useMemo(() => (text.match(/^\s*rule\b/gm) ?? []).length, [text]);
  const save = useMutation({
    mutationFn: () => saveRules(circuitId, text, saved.revision),
    onSuccess: (view) => queryClient.setQueryData(proofKeys.rules(circuitId), view),
  });
  const conflict = save.error instanceof ApiError && save.error.status === 409;
  const changed = text !== saved.text;

  const edit = (next: string) => {
    setText(next);
    onDraft(next);
    save.reset();
  };

  const addTemplate = (id: string) => {
    const picked = saved.templates.find((t) => t.id === id);
    if (!picked) return;
    edit(text.trim() ? `${text.trimEnd()}\n\n${picked.text}\n` : `${picked.text}\n`);
    setTemplate('');
  };

  return (
    <div className="space-y-3" data-testid="rules-panel">
      <p className="text-sm text-ink-soft">
        Write what the circuit must guarantee, one <code className="font-mono">rule &quot;name&quot;:</code> each. The search and the scenarios check these rules; the language is described in the README.
      </p>
      {canEdit && saved.templates.length ? (
        <label className="block text-sm text-ink">
          Start from safety practice
          <select
            value={template}
            onChange={(e) => addTemplate(e.target.value)}
            className="mt-1 block h-9 w-full rounded-md border border-rule bg-paper-raised px-2 text-sm"
            data-testid="rules-template"
          >
            <option value="">Add a rule written for this drawing…</option>
            {saved.templates.map((t) => (
              <option key={t.id} value={t.id}>
                {t.title} ({t.basis})
              </option>
            ))}
          </select>
        </label>
      ) : null}
      <RulesEditor value={text} onChange={edit} vocabulary={saved.vocabulary} errors={errors} label="Rules" readOnly={!canEdit} rows={12} testId="rules-editor" />
      <div className="flex flex-wrap items-center gap-2">
        {canEdit ? (
          <Button onClick={() => save.mutate()} disabled={!changed || errors.length > 0 || save.isPending} data-testid="rules-save">
            {save.isPending ? 'Saving…' : 'Save the rules'}
          </Button>
        ) : null}
        <span className="text-xs text-ink-soft" data-testid="rules-status">
          {ruleCount === 1 ? '1 rule' : `${ruleCount} rules`} · {changed ? 'not saved yet' : saved.revision === 0 ? 'nothing saved yet' : `saved (save ${saved.revision})`}
        </span>
      </div>
      {save.isSuccess && !changed ? <FormAlert tone="success">The rules are saved.</FormAlert> : null}
      {save.error ? (
        <FormAlert tone="error">
          {save.error.message}{' '}
          {conflict ? (
            <Button size="sm" variant="secondary" onClick={() => void queryClient.invalidateQueries({ queryKey: proofKeys.rules(circuitId) })}>
              Load the rules as saved
            </Button>
          ) : null}
        </FormAlert>
      ) : null}
    </div>
  );
}
