/**
 * The horizon and output interval of the editor's live run. The engine's last steps before its
 * horizon are cut short, so rows depend on it: a saved run is simulated again on the server
 * towards the same horizon to give the rows the person watched. Plain constants, read by the
 * browser (components/editor/run/use-live-run.ts) and the server (simulate-saved-run.ts).
 */
export const LIVE_RUN_HORIZON_S = 600;
export const LIVE_RUN_INTERVAL_S = 0.01;
