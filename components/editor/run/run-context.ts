'use client';

import { createContext } from 'react';
import type { ComponentRunState } from './run-frame';

/** What the canvas's parts need of a run in progress: their states now, and a way to work a button. */
export interface RunView {
  running: boolean;
  states: ReadonlyMap<string, ComponentRunState>;
  /** Gauge pressure at each port, bar, keyed `component:port`. */
  portBar: ReadonlyMap<string, number>;
  /** Air leaving the part at each port, l/min (ANR), negative going in; keyed `component:port`. */
  portFlow: ReadonlyMap<string, number>;
  /** A pointer went down on or up from a part during the run; `keep` (Shift held) latches a push-button. */
  actuate: (componentId: string, phase: 'down' | 'up', keep?: boolean) => void;
}

export const RunContext = createContext<RunView>({ running: false, states: new Map(), portBar: new Map(), portFlow: new Map(), actuate: () => {} });
