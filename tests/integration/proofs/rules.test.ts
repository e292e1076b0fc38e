import { beforeAll, describe, expect, it } from 'vitest';
import * as circuitRules from '@/app/api/circuits/[id]/rules/route';
import { ruleTemplates } from '@/engine/proof/rules';
import { createCircuit } from '@/lib/circuits/create-circuit';
import { AuditEvent, CircuitRules } from '@/models';
import { callRoute, lidPress } from '../call-route';
import { createTestWorkspace, type TestWorkspace } from '../fixtures';

interface RulesJson {
  text: string;
  revision: number;
  templates: Array<{ id: string; title: string; basis: string; text: string }>;
  vocabulary: unknown[];
}

interface ErrorJson {
  error: { code: string; message: string; field?: string; errors?: Array<{ line: number; column: number; message: string }> };
}

describe('circuit rules', () => {
  let ws: TestWorkspace;
  let circuitId: string;
  const { document } = lidPress();
  const twoHand = ruleTemplates(document).find((t) => t.id === 'two-hand-1A1')!;

  beforeAll(async () => {
    ws = await createTestWorkspace('rules');
    circuitId = (await createCircuit({ workspaceId: ws.workspaceId, authorId: ws.users.engineer.id, input: { title: 'Lid press rules', description: '', message: '', document } })).id;
  });

  const read = (userId = ws.users.viewer.id) => callRoute<RulesJson & ErrorJson>(circuitRules.GET, `/api/circuits/${circuitId}/rules`, { userId, id: circuitId });
  const put = (body: object, userId = ws.users.engineer.id) => callRoute<RulesJson & ErrorJson>(circuitRules.PUT, `/api/circuits/${circuitId}/rules`, { userId, method: 'PUT', body, id: circuitId });

  it('starts empty at save 0 and offers the templates and vocabulary of the newest revision', async () => {
    const { status, json } = await read();
    expect(status).toBe(200);
    expect(json.text).toBe('');
    expect(json.revision).toBe(0);
    expect(json.templates.map((t) => t.id)).toContain('two-hand-1A1');
    expect(json.templates.find((t) => t.id === 'two-hand-1A1')?.text).toContain('1S1 is pressed, 1S2 is pressed');
    expect(json.vocabulary.length).toBeGreaterThan(0);
  });

  it('saves a text that binds, counts the save, and refuses a writer holding an older save', async () => {
    const first = await put({ text: twoHand.text, revision: 0 });
    expect(first.status).toBe(200);
    expect(first.json).toMatchObject({ text: twoHand.text, revision: 1 });
    expect((await read()).json).toMatchObject({ text: twoHand.text, revision: 1 });

    const edited = `${twoHand.text}\n# reviewed\n`;
    const second = await put({ text: edited, revision: 1 }, ws.users.owner.id);
    expect(second.json.revision).toBe(2);

    const stale = await put({ text: 'rule "late": never 1A1 is extending', revision: 1 });
    expect(stale.status).toBe(409);
    expect(stale.json.error).toMatchObject({ code: 'conflict:rules', field: 'revision' });
    expect(stale.json.error.message).toContain('saved meanwhile');
    const stored = await CircuitRules.findByPk(circuitId, { rejectOnEmpty: true });
    expect({ text: stored.text, revision: stored.revision, updatedById: stored.updatedById }).toEqual({ text: edited, revision: 2, updatedById: ws.users.owner.id });

    const audits = await AuditEvent.count({ where: { action: 'rules.saved', targetId: circuitId } });
    expect(audits).toBe(2);
  });

  it('refuses a text that does not parse or bind, naming line and column, and lists every error', async () => {
    const text = ['# two mistakes', 'rule "wobble": always 1A1 is wobbly', 'rule "ghost": never 9Z9 is pressed'].join('\n');
    const refused = await put({ text, revision: 2 });
    expect(refused.status).toBe(400);
    expect(refused.json.error.code).toBe('invalid:text');
    expect(refused.json.error.field).toBe('text');
    const errors = refused.json.error.errors!;
    expect(errors).toHaveLength(2);
    expect(errors.map((e) => e.line)).toEqual([2, 3]);
    expect(refused.json.error.message).toMatch(new RegExp(`^text: line 2, column ${errors[0]!.column}: .*wobbly.*\\(and 1 more\\)`));
    expect(errors[1]!.message).toContain('9Z9');
    expect((await read()).json.revision).toBe(2);
  });

  it('refuses malformed bodies with the field at fault', async () => {
    const missing = await put({ text: '' });
    expect(missing.status).toBe(400);
    expect(missing.json.error).toMatchObject({ code: 'invalid:revision', field: 'revision' });
    const extra = await put({ text: '', revision: 2, colour: 'teal' });
    expect(extra.status).toBe(400);
  });

  it('lets every member read the rules and only owners and engineers change them', async () => {
    for (const role of ['viewer', 'technician', 'reviewer'] as const) {
      expect((await read(ws.users[role].id)).status).toBe(200);
      const refused = await put({ text: '', revision: 2 }, ws.users[role].id);
      expect(refused.status).toBe(403);
      expect(refused.json.error.code).toBe('forbidden:rules');
    }
    const other = await createTestWorkspace('rules-other');
    expect((await read(other.users.owner.id)).status).toBe(404);
  });
});
