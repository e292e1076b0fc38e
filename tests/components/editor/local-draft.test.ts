import { describe, expect, it } from 'vitest';
import { clearDraft, readDraft, writeDraft } from '@/components/editor/local-draft';
import { emptyDocument } from '@/engine/document/schema';

class MemoryStorage {
  readonly items = new Map<string, string>();
  getItem(key: string) {
    return this.items.get(key) ?? null;
  }
  setItem(key: string, value: string) {
    this.items.set(key, value);
  }
  removeItem(key: string) {
    this.items.delete(key);
  }
}

const document = { ...emptyDocument(), components: [{ id: 'v', type: 'valve-5-2', tag: '1V1', parameters: {}, position: { x: 10, y: 20 }, rotation: 0 as const, mirrored: false }] };

describe('local draft', () => {
  it('comes back for the revision it was started from, and only for that one', () => {
    const storage = new MemoryStorage();
    writeDraft(storage, 'c1', { baseLockVersion: 3, savedAt: '2026-12-02T07:00:00.000Z', document });
    expect(readDraft(storage, 'c1', 3)?.document).toEqual(document);
    expect(readDraft(storage, 'c1', 4)).toBeNull();
    expect(readDraft(storage, 'c2', 3)).toBeNull();
    clearDraft(storage, 'c1');
    expect(readDraft(storage, 'c1', 3)).toBeNull();
  });

  it('ignores stored text that is not a valid draft', () => {
    const storage = new MemoryStorage();
    storage.setItem('airproof:draft:c1', '{not json');
    expect(readDraft(storage, 'c1', 1)).toBeNull();
    storage.setItem('airproof:draft:c1', JSON.stringify({ baseLockVersion: 1, savedAt: 'x', document: { schemaVersion: 99 } }));
    expect(readDraft(storage, 'c1', 1)).toBeNull();
  });
});
