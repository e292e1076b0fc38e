import { circuitDocumentSchema, type CircuitDocument } from '@/engine/document/schema';

/**
 * Unsaved work kept in the browser between reloads: the document and the lock version of the
 * revision it was started from. A draft of an older revision is not offered on a newer one.
 */
export interface LocalDraft {
  baseLockVersion: number;
  savedAt: string;
  document: CircuitDocument;
}

const keyOf = (circuitId: string) => `airproof:draft:${circuitId}`;

export function readDraft(storage: Pick<Storage, 'getItem'>, circuitId: string, lockVersion: number): LocalDraft | null {
  try {
    const raw = JSON.parse(storage.getItem(keyOf(circuitId)) ?? 'null') as Partial<LocalDraft> | null;
    if (!raw || raw.baseLockVersion !== lockVersion || typeof raw.savedAt !== 'string') return null;
    const document = circuitDocumentSchema.safeParse(raw.document);
    return document.success ? { baseLockVersion: lockVersion, savedAt: raw.savedAt, document: document.data } : null;
  } catch {
    return null;
  }
}

export function writeDraft(storage: Pick<Storage, 'setItem'>, circuitId: string, draft: LocalDraft): void {
  try {
    storage.setItem(keyOf(circuitId), JSON.stringify(draft));
  } catch {
    // A full or blocked storage only loses the safety copy; the editor keeps working.
  }
}

export function clearDraft(storage: Pick<Storage, 'removeItem'>, circuitId: string): void {
  storage.removeItem(keyOf(circuitId));
}
