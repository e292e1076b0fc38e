'use client';

import { createContext } from 'react';
import type { EditorStore } from './editor-store';

/**
 * The store tubes and wires on the canvas reshape themselves through, or null where they may not
 * be reshaped (a read-only canvas, or a run in progress).
 */
export const EdgeEditingContext = createContext<EditorStore | null>(null);
