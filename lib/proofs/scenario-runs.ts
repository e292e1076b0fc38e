import 'server-only';
import { randomUUID } from 'node:crypto';
import type { CircuitDocument } from '@/engine/document/schema';
import { checkRules, type RuleVerdict } from '@/engine/proof/rules';
import type { InputEvent } from '@/engine/solver/simulate';
import type { Actor } from '@/lib/auth/actor';
import type { RevisionWithAuthor } from '@/lib/circuits/revision-view';
import { getSequelize } from '@/lib/db';
import { AppError, errorBody, type ErrorBody } from '@/lib/errors';
import { bindRulesText } from '@/lib/proofs/bind-rules';
import { revisionWithDocument } from '@/lib/proofs/revision-with-document';
import { findScenario, scenariosOf } from '@/lib/proofs/scenarios';
import { storeRunTrace } from '@/lib/runs/save-run';
import { simulateSavedRun, type RunSummary } from '@/lib/runs/simulate-saved-run';
import { Run, Scenario } from '@/models';

/** What a scenario run's summary holds beside the trace figures. */
export interface ScenarioRunSummary extends RunSummary {
  scenarioId: string;
  passed: boolean;
  verdicts: RuleVerdict[];
}

export interface ScenarioRunResult {
  scenarioId: string;
  name: string;
  runId: string;
  revisionNumber: number;
  /** Every expectation held. */
  passed: boolean;
  verdicts: RuleVerdict[];
}

/** Simulates one scenario on a revision, checks its expectations on the trace, and saves the run. */
async function simulateScenario({ actor, scenario, revision, document }: { actor: Actor; scenario: Scenario; revision: RevisionWithAuthor; document: CircuitDocument }): Promise<ScenarioRunResult> {
  const expectations = bindRulesText({ text: scenario.expectations, document, revisionNumber: revision.number, field: 'expectations' });
  const inputs = scenario.inputs as InputEvent[];
  const { trace, summary } = simulateSavedRun({ document, inputs, untilS: scenario.untilS });
  const verdicts = checkRules(expectations, trace);
  const passed = verdicts.every((v) => v.holds);
  const runId = randomUUID();
  const traceKey = await storeRunTrace({ runId, trace });
  const runSummary: ScenarioRunSummary = { ...summary, scenarioId: scenario.id, passed, verdicts };
  await Run.create({ id: runId, revisionId: revision.id, kind: 'scenario', name: scenario.name, status: 'succeeded', inputs, summary: runSummary, traceKey, createdById: actor.userId, finishedAt: new Date() });
  return { scenarioId: scenario.id, name: scenario.name, runId, revisionNumber: revision.number, passed, verdicts };
}

/** Runs one scenario on the circuit's newest revision, or on the one numbered. */
export async function runScenario({ actor, scenarioId, revisionNumber }: { actor: Actor; scenarioId: string; revisionNumber?: number }): Promise<ScenarioRunResult> {
  getSequelize();
  const scenario = await findScenario({ workspaceId: actor.workspaceId, scenarioId });
  const { revision, document } = await revisionWithDocument({ workspaceId: actor.workspaceId, circuitId: scenario.circuitId, number: revisionNumber });
  return simulateScenario({ actor, scenario, revision, document });
}

export type SuiteEntry = ScenarioRunResult | ({ scenarioId: string; name: string; passed: false } & ErrorBody);

export interface SuiteResult {
  revisionNumber: number;
  /** Every scenario ran and every expectation held. */
  passed: boolean;
  results: SuiteEntry[];
}

/**
 * Runs every scenario of a circuit on its newest revision, one after another. A scenario that
 * cannot run there (its expectations or inputs no longer fit the drawing) is reported in its entry;
 * the others still run.
 */
export async function runScenarioSuite({ actor, circuitId }: { actor: Actor; circuitId: string }): Promise<SuiteResult> {
  getSequelize();
  const { revision, document } = await revisionWithDocument({ workspaceId: actor.workspaceId, circuitId });
  const scenarios = await scenariosOf(circuitId);
  const results: SuiteEntry[] = [];
  for (const scenario of scenarios) {
    try {
      results.push(await simulateScenario({ actor, scenario, revision, document }));
    } catch (error) {
      if (!(error instanceof AppError) || error.type !== 'invalid') throw error;
      results.push({ scenarioId: scenario.id, name: scenario.name, passed: false, ...errorBody(error) });
    }
  }
  return { revisionNumber: revision.number, passed: results.every((r) => r.passed), results };
}
