import { requestJson, sendJson } from '@/components/api/request-json';
import type { InputEvent } from '@/engine/solver/simulate';
import type { ProofDetail, ProofPage } from '@/lib/proofs/proofs';
import type { RulesView } from '@/lib/proofs/rules';
import type { ScenarioRunResult, SuiteResult } from '@/lib/proofs/scenario-runs';
import type { ScenarioView } from '@/lib/proofs/scenarios';
import type { StartProofBody } from '@/lib/proofs/schemas';

// Types only: the shapes come from the server modules, so the pages and the routes cannot drift apart.
export type { ProofDetail, ProofSummary, StoredRuleOutcome } from '@/lib/proofs/proofs';
export type { RulesView } from '@/lib/proofs/rules';
export type { ScenarioRunResult, SuiteEntry, SuiteResult } from '@/lib/proofs/scenario-runs';
export type { ScenarioView } from '@/lib/proofs/scenarios';
export type { StartProofBody } from '@/lib/proofs/schemas';

export const proofKeys = {
  rules: (circuitId: string) => ['circuits', circuitId, 'rules'] as const,
  scenarios: (circuitId: string) => ['circuits', circuitId, 'scenarios'] as const,
  proofs: (circuitId: string, page: number) => ['circuits', circuitId, 'proofs', page] as const,
  allProofs: (circuitId: string) => ['circuits', circuitId, 'proofs'] as const,
  proof: (proofId: string) => ['proofs', proofId] as const,
};

const circuitBase = (circuitId: string) => `/api/circuits/${encodeURIComponent(circuitId)}`;

export const fetchRules = (circuitId: string, signal: AbortSignal) => requestJson<RulesView>(`${circuitBase(circuitId)}/rules`, signal);

export const saveRules = (circuitId: string, text: string, revision: number) => sendJson<RulesView>('PUT', `${circuitBase(circuitId)}/rules`, { text, revision });

export const fetchScenarios = (circuitId: string, signal: AbortSignal) => requestJson<{ items: ScenarioView[] }>(`${circuitBase(circuitId)}/scenarios`, signal);

export interface ScenarioFields {
  name: string;
  inputs: InputEvent[];
  untilS: number;
  expectations: string;
}

export const createScenario = (circuitId: string, fields: ScenarioFields) => sendJson<ScenarioView>('POST', `${circuitBase(circuitId)}/scenarios`, fields);

export const updateScenario = (scenarioId: string, revision: number, fields: ScenarioFields) =>
  sendJson<ScenarioView>('PATCH', `/api/scenarios/${encodeURIComponent(scenarioId)}`, { revision, ...fields });

export const deleteScenario = (scenarioId: string) => sendJson<{ ok: true }>('DELETE', `/api/scenarios/${encodeURIComponent(scenarioId)}`);

export const runScenario = (scenarioId: string) => sendJson<ScenarioRunResult>('POST', `/api/scenarios/${encodeURIComponent(scenarioId)}/run`);

export const runScenarioSuite = (circuitId: string) => sendJson<SuiteResult>('POST', `${circuitBase(circuitId)}/scenarios/run`);

export const fetchProofs = (circuitId: string, page: number, signal: AbortSignal) => requestJson<ProofPage>(`${circuitBase(circuitId)}/proofs?page=${page}&pageSize=10`, signal);

export const fetchProof = (proofId: string, signal: AbortSignal) => requestJson<ProofDetail>(`/api/proofs/${encodeURIComponent(proofId)}`, signal);

export const startProof = (circuitId: string, body: StartProofBody) => sendJson<{ id: string }>('POST', `${circuitBase(circuitId)}/proofs`, body);

export const cancelProof = (proofId: string) => sendJson<ProofDetail>('POST', `/api/proofs/${encodeURIComponent(proofId)}/cancel`);
