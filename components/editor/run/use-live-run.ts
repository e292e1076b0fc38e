'use client';

import { useCallback, useEffect, useRef, useState } from 'react';
import type { CircuitDocument } from '@/engine/document/schema';
import type { InputEvent } from '@/engine/solver/simulate';
import type { RunTrace } from './run-frame';
import type { SimulateReply, SimulateRequest } from './run-protocol';

/** Machine time a run covers, s: a few machine cycles of the circuits people draw here. */
export const RUN_HORIZON_S = 30;
const OUTPUT_INTERVAL_S = 0.01;
/** Playback speeds, machine seconds per wall second; Infinity shows the end of the run at once. */
export const RUN_SPEEDS = [0.1, 0.25, 0.5, 1, 2, 5, 10, Infinity] as const;

export type RunStatus = 'stopped' | 'starting' | 'playing' | 'paused' | 'ended' | 'failed';

/**
 * A run of the drawing in a Web Worker, played back on the page at a chosen speed. The engine
 * is deterministic, so an input given during the run (a button pressed at playback time t) is
 * applied by simulating again from t = 0 with it added: everything before t comes out the same,
 * and what follows changes. Until the new result arrives the old one keeps playing.
 */
export function useLiveRun() {
  const [status, setStatus] = useState<RunStatus>('stopped');
  const [trace, setTrace] = useState<RunTrace | null>(null);
  const [t, setT] = useState(0);
  const [speed, setSpeed] = useState<(typeof RUN_SPEEDS)[number]>(1);
  const [message, setMessage] = useState<string | null>(null);
  const [computeMs, setComputeMs] = useState<number | null>(null);
  const worker = useRef<Worker | null>(null);
  const requestId = useRef(0);
  const inputs = useRef<InputEvent[]>([]);
  const clock = useRef({ t: 0, last: 0, speed: 1 as number, playing: false });
  // The drawing being run: editing is locked during a run, so it stays as it was at the start.
  const runDocument = useRef<CircuitDocument | null>(null);

  const request = useCallback(() => {
    if (!worker.current) {
      worker.current = new Worker(new URL('./simulation.worker.ts', import.meta.url), { type: 'module' });
      worker.current.onmessage = (event: MessageEvent<SimulateReply>) => {
        const reply = event.data;
        if (reply.requestId !== requestId.current) return;
        if (reply.kind === 'failed') {
          clock.current.playing = false;
          setStatus('failed');
          setMessage(reply.message);
          return;
        }
        setTrace({ intervalS: reply.intervalS, time: reply.time, names: reply.names, columns: reply.columns });
        setComputeMs(reply.computeMs);
        setStatus((s) => (s === 'starting' ? 'playing' : s));
        if (!clock.current.playing && clock.current.t === 0) {
          clock.current.playing = true;
          clock.current.last = performance.now();
        }
      };
    }
    requestId.current += 1;
    const message: SimulateRequest = {
      kind: 'simulate',
      requestId: requestId.current,
      document: runDocument.current!,
      inputs: inputs.current,
      untilS: RUN_HORIZON_S,
      intervalS: OUTPUT_INTERVAL_S,
    };
    worker.current.postMessage(message);
  }, []);

  const start = useCallback((document: CircuitDocument) => {
    runDocument.current = document;
    inputs.current = [];
    clock.current = { t: 0, last: performance.now(), speed: clock.current.speed, playing: false };
    setT(0);
    setTrace(null);
    setMessage(null);
    setStatus('starting');
    request();
  }, [request]);

  const pause = useCallback(() => {
    clock.current.playing = false;
    setStatus('paused');
  }, []);

  const resume = useCallback(() => {
    clock.current.playing = true;
    clock.current.last = performance.now();
    setStatus('playing');
  }, []);

  const reset = useCallback(() => {
    requestId.current += 1;
    clock.current.playing = false;
    clock.current.t = 0;
    inputs.current = [];
    setT(0);
    setTrace(null);
    setMessage(null);
    setStatus('stopped');
  }, []);

  /** Gives a part an input at the present playback time (press, release, toggle). */
  const act = useCallback(
    (componentId: string, action: InputEvent['action']) => {
      inputs.current = [...inputs.current, { t: clock.current.t, component: componentId, action }];
      request();
    },
    [request],
  );

  /** While paused: one output interval further. */
  const step = useCallback(() => {
    const c = clock.current;
    if (c.playing) return;
    c.t = Math.min(RUN_HORIZON_S, c.t + OUTPUT_INTERVAL_S);
    setT(c.t);
  }, []);

  const changeSpeed = useCallback((next: (typeof RUN_SPEEDS)[number]) => {
    clock.current.speed = next;
    setSpeed(next);
  }, []);

  // The playback clock: machine time advances by the wall time since the last frame times the speed.
  useEffect(() => {
    if (status !== 'playing' && status !== 'starting') return;
    let frame = 0;
    const tick = (now: number) => {
      const c = clock.current;
      if (c.playing) {
        c.t = Math.min(RUN_HORIZON_S, c.t + ((now - c.last) / 1000) * c.speed);
        c.last = now;
        setT(c.t);
        if (c.t >= RUN_HORIZON_S) {
          c.playing = false;
          setStatus('ended');
          return;
        }
      }
      frame = requestAnimationFrame(tick);
    };
    frame = requestAnimationFrame(tick);
    return () => cancelAnimationFrame(frame);
  }, [status]);

  useEffect(() => () => worker.current?.terminate(), []);

  return { status, trace, t, speed, message, computeMs, start, pause, resume, reset, act, step, changeSpeed };
}
