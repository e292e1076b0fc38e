import 'server-only';
import { UniqueConstraintError } from 'sequelize';
import type { CircuitDocument } from '@/engine/document/schema';
import type { InputEvent } from '@/engine/solver/simulate';
import { recordAudit } from '@/lib/audit';
import type { Actor } from '@/lib/auth/actor';
import { findCircuit } from '@/lib/circuits/revision-view';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { bindRulesText } from '@/lib/proofs/bind-rules';
import { revisionWithDocument } from '@/lib/proofs/revision-with-document';
import type { CreateScenarioBody, UpdateScenarioBody } from '@/lib/proofs/schemas';
import { Circuit, Scenario } from '@/models';

export interface ScenarioView {
  id: string;
  circuitId: string;
  name: string;
  inputs: InputEvent[];
  untilS: number;
  expectations: string;
  /** How many times it was saved; send it back with the next change. */
  revision: number;
  createdAt: string;
  updatedAt: string;
}

function scenarioView(s: Scenario): ScenarioView {
  return {
    id: s.id,
    circuitId: s.circuitId,
    name: s.name,
    inputs: s.inputs as InputEvent[],
    untilS: s.untilS,
    expectations: s.expectations,
    revision: s.revision,
    createdAt: s.createdAt.toISOString(),
    updatedAt: s.updatedAt.toISOString(),
  };
}

/** A scenario of a circuit in the workspace; `not_found:scenario` otherwise. */
export async function findScenario({ workspaceId, scenarioId }: { workspaceId: string; scenarioId: string }): Promise<Scenario> {
  getSequelize();
  const scenario = await Scenario.findOne({ where: { id: scenarioId }, include: [{ model: Circuit, as: 'circuit', attributes: [], where: { workspaceId }, required: true }] });
  if (!scenario) throw new AppError('not_found', 'scenario', 'No such scenario in this workspace');
  return scenario;
}

/** A circuit's scenarios by name. */
export async function scenariosOf(circuitId: string): Promise<Scenario[]> {
  const sequelize = getSequelize();
  return Scenario.findAll({ where: { circuitId }, order: [[sequelize.fn('lower', sequelize.col('name')), 'ASC'], ['id', 'ASC']] });
}

export async function listScenarios({ workspaceId, circuitId }: { workspaceId: string; circuitId: string }): Promise<ScenarioView[]> {
  getSequelize();
  await findCircuit({ workspaceId, circuitId });
  return (await scenariosOf(circuitId)).map(scenarioView);
}

/** Inputs must name parts of the drawing, and expectations must bind to it, as the newest revision has them. */
function checkAgainst({ document, revisionNumber, inputs, expectations }: { document: CircuitDocument; revisionNumber: number; inputs: readonly InputEvent[]; expectations: string }): void {
  const known = new Set(document.components.flatMap((c) => [c.id, c.tag]));
  const unknown = inputs.findIndex((input) => !known.has(input.component));
  if (unknown >= 0) {
    const field = `inputs.${unknown}.component`;
    throw new AppError('invalid', field, `${field}: revision ${revisionNumber} has no part ${inputs[unknown]!.component}`, field);
  }
  bindRulesText({ text: expectations, document, revisionNumber, field: 'expectations' });
}

function staleScenario(had: number): AppError {
  return new AppError('conflict', 'scenario', `The scenario was saved since you loaded save ${had}; load it again and apply your change`, 'revision');
}

function nameTaken(name: string): AppError {
  return new AppError('conflict', 'scenario', `This circuit already has a scenario named "${name}"`, 'name');
}

export async function createScenario({ actor, circuitId, input }: { actor: Actor; circuitId: string; input: CreateScenarioBody }): Promise<ScenarioView> {
  const sequelize = getSequelize();
  const { revision, document } = await revisionWithDocument({ workspaceId: actor.workspaceId, circuitId });
  checkAgainst({ document, revisionNumber: revision.number, inputs: input.inputs, expectations: input.expectations });
  try {
    return await sequelize.transaction(async (transaction) => {
      const scenario = await Scenario.create({ circuitId, ...input, createdById: actor.userId, updatedById: actor.userId }, { transaction });
      await recordAudit({ action: 'scenario.created', actorId: actor.userId, workspaceId: actor.workspaceId, targetType: 'scenario', targetId: scenario.id, data: { circuitId, name: input.name } }, transaction);
      return scenarioView(scenario);
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError) throw nameTaken(input.name);
    throw error;
  }
}

/** Changes the fields given. The writer must have read the latest save (`conflict:scenario` otherwise). */
export async function updateScenario({ actor, scenarioId, input }: { actor: Actor; scenarioId: string; input: UpdateScenarioBody }): Promise<ScenarioView> {
  const sequelize = getSequelize();
  const scenario = await findScenario({ workspaceId: actor.workspaceId, scenarioId });
  const { revision: expected, ...changes } = input;
  if (scenario.revision !== expected) throw staleScenario(expected);
  const merged = { inputs: (changes.inputs ?? scenario.inputs) as InputEvent[], untilS: changes.untilS ?? scenario.untilS, expectations: changes.expectations ?? scenario.expectations };
  const late = merged.inputs.findIndex((event) => event.t > merged.untilS);
  if (late >= 0) throw new AppError('invalid', `inputs.${late}.t`, `inputs.${late}.t: after the end of the scenario (${merged.untilS} s)`, `inputs.${late}.t`);
  const { revision, document } = await revisionWithDocument({ workspaceId: actor.workspaceId, circuitId: scenario.circuitId });
  checkAgainst({ document, revisionNumber: revision.number, ...merged });
  try {
    return await sequelize.transaction(async (transaction) => {
      // Compare and set on the save count: a writer who read an older save changes nothing.
      const [, rows] = await Scenario.update(
        { ...changes, revision: expected + 1, updatedById: actor.userId },
        { where: { id: scenarioId, revision: expected }, returning: true, transaction },
      );
      const updated = rows[0];
      if (!updated) throw staleScenario(expected);
      await recordAudit({ action: 'scenario.updated', actorId: actor.userId, workspaceId: actor.workspaceId, targetType: 'scenario', targetId: scenarioId, data: { revision: updated.revision } }, transaction);
      return scenarioView(updated);
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError) throw nameTaken(changes.name ?? scenario.name);
    throw error;
  }
}

export async function deleteScenario({ actor, scenarioId }: { actor: Actor; scenarioId: string }): Promise<void> {
  const scenario = await findScenario({ workspaceId: actor.workspaceId, scenarioId });
  await getSequelize().transaction(async (transaction) => {
    await scenario.destroy({ transaction });
    await recordAudit({ action: 'scenario.deleted', actorId: actor.userId, workspaceId: actor.workspaceId, targetType: 'scenario', targetId: scenarioId, data: { circuitId: scenario.circuitId, name: scenario.name } }, transaction);
  });
}
