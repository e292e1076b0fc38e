'use client';

import { useId, useMemo, useState } from 'react';
import { paletteGroups } from './palette-groups';

/** MIME type of a palette item dragged onto the canvas: the component type id. */
export const PALETTE_DRAG_TYPE = 'application/x-airproof-component-type';

/** The parts shelf: types grouped by the levels of a circuit drawing, with search. Click adds at the view's centre; drag places. */
export function Palette({ onAdd }: { onAdd: (typeId: string) => void }) {
  const [search, setSearch] = useState('');
  const groups = useMemo(() => paletteGroups(search), [search]);
  const searchId = useId();

  return (
    <nav aria-label="Parts" className="flex h-full min-h-0 flex-col">
      <div className="border-b border-rule p-3">
        <label htmlFor={searchId} className="mb-1 block text-xs font-medium text-ink-soft">
          Find a part
        </label>
        <input
          id={searchId}
          type="search"
          value={search}
          onChange={(e) => setSearch(e.target.value)}
          placeholder="5/2, cylinder, relay …"
          className="h-8 w-full rounded-md border border-rule bg-paper-raised px-2 text-sm text-ink placeholder:text-ink-faint"
          data-testid="palette-search"
        />
      </div>
      <div className="min-h-0 flex-1 overflow-y-auto p-2">
        {groups.length === 0 ? <p className="p-2 text-sm text-ink-soft">No part matches “{search}”.</p> : null}
        {groups.map((group) => (
          <section key={group.id} className="mb-3">
            <h2 className="px-2 pb-1 text-xs font-semibold uppercase tracking-wide text-ink-faint">{group.title}</h2>
            <ul>
              {group.types.map((type) => (
                <li key={type.id}>
                  <button
                    type="button"
                    draggable
                    onDragStart={(e) => {
                      e.dataTransfer.setData(PALETTE_DRAG_TYPE, type.id);
                      e.dataTransfer.effectAllowed = 'copy';
                    }}
                    onClick={() => onAdd(type.id)}
                    title={type.description}
                    className="w-full rounded-md px-2 py-1 text-left text-sm text-ink hover:bg-paper-sunk focus-visible:bg-paper-sunk"
                    data-testid={`palette-item-${type.id}`}
                  >
                    {type.label}
                  </button>
                </li>
              ))}
            </ul>
          </section>
        ))}
      </div>
    </nav>
  );
}
