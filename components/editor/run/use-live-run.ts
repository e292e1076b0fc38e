'use client';

import { useCallback, useEffect, useRef, useState } from 'react';
import type { CircuitDocument } from '@/engine/document/schema';
import { LIVE_RUN_HORIZON_S, LIVE_RUN_INTERVAL_S } from '@/lib/runs/live-run';
import type { InputEvent } from '@/engine/solver/simulate';
import { LiveTrace } from './live-trace';
import type { RunTrace } from './run-frame';
import type { RunReply, RunRequest } from './run-protocol';
import type { FlowColumns } from './flow-columns';

/** Values a run may keep on the page (single precision: 4 bytes each), so that a long run of a big drawing stays within memory. */
const KEPT_VALUES = 25_000_000;
/** Playback speeds, machine seconds per wall second; Infinity runs as fast as the engine goes. */
export const RUN_SPEEDS = [0.1, 0.25, 0.5, 1, 2, 5, 10, Infinity] as const;
/**
 * How far the engine works ahead of the playback, in wall seconds at the chosen speed. A hand on
 * the drawing acts at the earliest time the engine has not yet settled, so this is also how late
 * an input can come out: a tenth of a second, about a human reaction's worth.
 */
const LEAD_WALL_S = 0.1;
const LEAD_MIN_S = 0.05;

export type RunStatus = 'stopped' | 'starting' | 'playing' | 'paused' | 'ended' | 'failed';

/** How long a run of a drawing with this many signals may go on, s. */
export function runLimitS(signals: number): number {
  const rows = Math.floor(KEPT_VALUES / Math.max(1, signals));
  return Math.min(LIVE_RUN_HORIZON_S, Math.floor(rows * LIVE_RUN_INTERVAL_S));
}

/**
 * A run of the drawing in a Web Worker, played back on the page at a chosen speed. The worker
 * simulates a little ahead of the playback and streams the rows as they settle; a hand on the
 * drawing goes to the worker at once and acts at the playback time, or at the earliest time the
 * engine can still change if it has already settled past that. The inputs as applied are kept,
 * so the run can be repeated exactly.
 */
export function useLiveRun() {
  const [status, setStatus] = useState<RunStatus>('stopped');
  const [trace, setTrace] = useState<RunTrace | null>(null);
  const [t, setT] = useState(0);
  const [speed, setSpeed] = useState<(typeof RUN_SPEEDS)[number]>(1);
  const [message, setMessage] = useState<string | null>(null);
  /** Machine seconds the engine simulates per second of its own work. */
  const [pace, setPace] = useState<number | null>(null);
  /** The playback has caught up with the engine and waits for it. */
  const [waiting, setWaiting] = useState(false);
  const [limitS, setLimitS] = useState(LIVE_RUN_HORIZON_S);
  const [flows, setFlows] = useState<FlowColumns>({ ports: {}, tubes: {} });
  const worker = useRef<Worker | null>(null);
  const runId = useRef(0);
  const live = useRef<LiveTrace | null>(null);
  const finished = useRef(false);
  const applied = useRef<InputEvent[]>([]);
  const work = useRef({ machineS: 0, wallMs: 0 });
  const clock = useRef({ t: 0, last: 0, speed: 1 as number, playing: false, stepTo: 0, limit: LIVE_RUN_HORIZON_S });

  const send = useCallback((request: RunRequest) => worker.current?.postMessage(request), []);

  /** Asks the engine to be ahead of the playback by the lead. */
  const askAhead = useCallback(() => {
    const c = clock.current;
    const lead = Number.isFinite(c.speed) ? Math.max(LEAD_MIN_S, c.speed * LEAD_WALL_S) : c.limit;
    send({ kind: 'advance', runId: runId.current, toS: Math.min(c.limit, Math.max(c.t, c.stepTo) + lead) });
  }, [send]);

  const onReply = useCallback(
    (reply: RunReply) => {
      if (reply.runId !== runId.current) return;
      const c = clock.current;
      if (reply.kind === 'failed') {
        c.playing = false;
        setStatus('failed');
        setMessage(reply.message);
        return;
      }
      if (reply.kind === 'started') {
        live.current = new LiveTrace(reply.names, reply.intervalS);
        setFlows(reply.flows);
        c.limit = runLimitS(reply.names.length);
        setLimitS(c.limit);
        askAhead();
        return;
      }
      if (reply.kind === 'input-applied') {
        applied.current = [...applied.current, reply.input];
        return;
      }
      const rows = live.current!;
      const before = rows.lastTime;
      rows.append(reply.first, reply.time, reply.values, reply.events);
      finished.current = reply.finished;
      work.current.machineS += rows.lastTime - before;
      work.current.wallMs += reply.computeMs;
      if (work.current.wallMs > 0) setPace(work.current.machineS / (work.current.wallMs / 1000));
      setTrace(rows.view());
      // A step asked for while paused moves once its row is there.
      if (!c.playing && c.stepTo > c.t) {
        c.t = Math.min(c.stepTo, rows.lastTime);
        setT(c.t);
      }
      setStatus((s) => {
        if (s !== 'starting') return s;
        c.playing = true;
        c.last = performance.now();
        return 'playing';
      });
    },
    [askAhead],
  );

  const start = useCallback(
    (document: CircuitDocument) => {
      if (!worker.current) {
        worker.current = new Worker(new URL('./simulation.worker.ts', import.meta.url), { type: 'module' });
      }
      worker.current.onmessage = (event: MessageEvent<RunReply>) => onReply(event.data);
      runId.current += 1;
      live.current = null;
      finished.current = false;
      applied.current = [];
      work.current = { machineS: 0, wallMs: 0 };
      clock.current = { t: 0, last: performance.now(), speed: clock.current.speed, playing: false, stepTo: 0, limit: LIVE_RUN_HORIZON_S };
      setT(0);
      setTrace(null);
      setMessage(null);
      setPace(null);
      setWaiting(false);
      setStatus('starting');
      send({ kind: 'start', runId: runId.current, document, untilS: LIVE_RUN_HORIZON_S, intervalS: LIVE_RUN_INTERVAL_S });
    },
    [onReply, send],
  );

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
    send({ kind: 'stop', runId: runId.current });
    runId.current += 1;
    clock.current.playing = false;
    clock.current.t = 0;
    live.current = null;
    setT(0);
    setTrace(null);
    setMessage(null);
    setPace(null);
    setWaiting(false);
    setStatus('stopped');
  }, [send]);

  /** Gives a part an input at the present playback time (press, release, toggle). */
  const act = useCallback(
    (componentId: string, action: InputEvent['action']) => {
      send({ kind: 'input', runId: runId.current, input: { t: clock.current.t, component: componentId, action } });
    },
    [send],
  );

  /** While paused: one output interval further. */
  const step = useCallback(() => {
    const c = clock.current;
    if (c.playing) return;
    c.stepTo = Math.min(c.limit, Math.max(c.t, c.stepTo) + LIVE_RUN_INTERVAL_S);
    const available = live.current?.lastTime ?? 0;
    if (available >= c.stepTo - 1e-9) {
      c.t = c.stepTo;
      setT(c.t);
    }
    askAhead();
  }, [askAhead]);

  const changeSpeed = useCallback((next: (typeof RUN_SPEEDS)[number]) => {
    clock.current.speed = next;
    setSpeed(next);
  }, []);

  // The playback clock: machine time advances by the wall time since the last frame times the
  // speed, but never past the rows the engine has sent.
  useEffect(() => {
    if (status !== 'playing') return;
    let frame = 0;
    const tick = (now: number) => {
      const c = clock.current;
      if (c.playing) {
        const available = live.current?.lastTime ?? 0;
        const wanted = Number.isFinite(c.speed) ? c.t + ((now - c.last) / 1000) * c.speed : available;
        c.t = Math.min(wanted, available, c.limit);
        c.stepTo = c.t;
        c.last = now;
        setT(c.t);
        const atEnd = c.t >= c.limit - 1e-9 || (finished.current && c.t >= available);
        setWaiting(!atEnd && wanted > available + LIVE_RUN_INTERVAL_S);
        if (atEnd) {
          c.playing = false;
          setStatus('ended');
          return;
        }
        askAhead();
      }
      frame = requestAnimationFrame(tick);
    };
    frame = requestAnimationFrame(tick);
    return () => cancelAnimationFrame(frame);
  }, [askAhead, status]);

  useEffect(() => () => worker.current?.terminate(), []);

  return { status, trace, t, speed, message, pace, waiting, limitS, flows, applied, intervalS: LIVE_RUN_INTERVAL_S, start, pause, resume, reset, act, step, changeSpeed };
}
