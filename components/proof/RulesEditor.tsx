'use client';

import { useMemo, useRef, useState, type KeyboardEvent, type ReactNode } from 'react';
import { tokenizeRules, type RuleError, type RuleTokenKind, type VocabularyEntry } from '@/engine/proof/rules';
import { completionAt, type Completion } from './rule-completion';

/** Our own highlighting: structure words in teal, tags in indigo, figures in brown, comments faded (no bold: both layers must keep one width per letter). */
const TOKEN_CLASS: Record<RuleTokenKind, string> = {
  keyword: 'text-accent-strong',
  tag: 'text-[#4338ca]',
  word: 'text-ink',
  number: 'text-[#92400e]',
  unit: 'text-[#92400e]',
  string: 'text-[#166534]',
  comment: 'text-ink-faint italic',
  operator: 'text-ink-soft',
  punctuation: 'text-ink-soft',
  unknown: 'text-danger underline decoration-wavy',
};

/** Both layers must lay the text out identically for the colours to sit under the letters. */
const TEXT_LAYOUT = 'whitespace-pre-wrap break-words px-3 py-2 font-mono text-sm leading-6';

/**
 * A text box for rules with the words coloured by kind, suggestions of the drawing's tags, state
 * words and ports as one types (arrow keys and Enter or Tab take one, Escape closes them), and the
 * problems found listed under it by line and column.
 */
export function RulesEditor({
  value,
  onChange,
  vocabulary,
  errors,
  label,
  readOnly = false,
  rows = 10,
  testId,
}: {
  value: string;
  onChange: (text: string) => void;
  vocabulary: readonly VocabularyEntry[];
  errors: readonly RuleError[];
  label: string;
  readOnly?: boolean;
  rows?: number;
  testId: string;
}) {
  const area = useRef<HTMLTextAreaElement>(null);
  const backdrop = useRef<HTMLPreElement>(null);
  const [completion, setCompletion] = useState<Completion | null>(null);
  const [active, setActive] = useState(0);
  const tokens = useMemo(() => tokenizeRules(value), [value]);

  const refreshCompletion = (text: string, caret: number) => {
    setCompletion(readOnly ? null : completionAt(text, caret, vocabulary));
    setActive(0);
  };

  const accept = (index: number) => {
    if (!completion) return;
    const item = completion.items[index];
    if (!item) return;
    const next = value.slice(0, completion.from) + item.insert + ' ' + value.slice(completion.to);
    const caret = completion.from + item.insert.length + 1;
    onChange(next);
    setCompletion(null);
    requestAnimationFrame(() => {
      area.current?.focus();
      area.current?.setSelectionRange(caret, caret);
    });
  };

  const onKeyDown = (e: KeyboardEvent<HTMLTextAreaElement>) => {
    if (!completion) return;
    if (e.key === 'ArrowDown' || e.key === 'ArrowUp') {
      e.preventDefault();
      const n = completion.items.length;
      setActive((a) => (a + (e.key === 'ArrowDown' ? 1 : n - 1)) % n);
    } else if (e.key === 'Enter' || e.key === 'Tab') {
      e.preventDefault();
      accept(active);
    } else if (e.key === 'Escape') {
      e.preventDefault();
      setCompletion(null);
    }
  };

  const errorId = `${testId}-problems`;
  return (
    <div className="space-y-1">
      <label htmlFor={`${testId}-text`} className="block text-sm font-medium text-ink">
        {label}
      </label>
      <div className="relative rounded-md border border-rule bg-paper-raised focus-within:border-accent">
        <pre ref={backdrop} aria-hidden="true" className={`pointer-events-none absolute inset-0 m-0 overflow-hidden ${TEXT_LAYOUT}`}>
          {tokens.length === 0 ? null : renderTokens(value, tokens)}
          {'\n'}
        </pre>
        <textarea
          id={`${testId}-text`}
          ref={area}
          value={value}
          rows={rows}
          readOnly={readOnly}
          spellCheck={false}
          aria-invalid={errors.length > 0}
          aria-describedby={errors.length ? errorId : undefined}
          aria-autocomplete="list"
          onChange={(e) => {
            onChange(e.target.value);
            refreshCompletion(e.target.value, e.target.selectionStart);
          }}
          onKeyDown={onKeyDown}
          onClick={(e) => refreshCompletion(value, e.currentTarget.selectionStart)}
          onBlur={() => setTimeout(() => setCompletion(null), 150)}
          onScroll={(e) => {
            if (backdrop.current) backdrop.current.scrollTop = e.currentTarget.scrollTop;
          }}
          className={`relative block w-full resize-y bg-transparent text-transparent caret-ink outline-none ${TEXT_LAYOUT}`}
          data-testid={testId}
        />
      </div>
      {completion ? (
        <ul role="listbox" aria-label="Suggestions" className="flex flex-wrap gap-1" data-testid={`${testId}-suggestions`}>
          {completion.items.map((item, i) => (
            <li key={item.label} role="option" aria-selected={i === active}>
              <button
                type="button"
                onMouseDown={(e) => e.preventDefault()}
                onClick={() => accept(i)}
                className={`rounded border px-2 py-0.5 text-xs ${i === active ? 'border-accent bg-accent-soft text-ink' : 'border-rule bg-paper text-ink-soft'}`}
                title={item.detail}
              >
                <span className="font-mono">{item.label}</span> <span className="text-ink-faint">{item.detail}</span>
              </button>
            </li>
          ))}
        </ul>
      ) : null}
      {errors.length ? (
        <ul id={errorId} className="space-y-0.5 text-sm text-danger" data-testid={`${testId}-errors`}>
          {errors.map((e) => (
            <li key={`${e.line}:${e.column}:${e.message}`}>
              <span className="value font-mono">
                line {e.line}, column {e.column}
              </span>
              : {e.message}
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}

/** The text cut at the tokens, coloured; what lies between tokens (spaces, new lines) is kept as it is. */
function renderTokens(text: string, tokens: ReturnType<typeof tokenizeRules>) {
  const parts: ReactNode[] = [];
  let at = 0;
  tokens.forEach((t, i) => {
    if (t.from > at) parts.push(text.slice(at, t.from));
    parts.push(
      <span key={i} className={TOKEN_CLASS[t.kind]}>
        {text.slice(t.from, t.to)}
      </span>,
    );
    at = t.to;
  });
  if (at < text.length) parts.push(text.slice(at));
  return parts;
}
