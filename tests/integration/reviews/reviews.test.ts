import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { GET as GET_CIRCUIT } from '@/app/api/circuits/[id]/route';
import { GET as LIST_REVISIONS } from '@/app/api/circuits/[id]/revisions/route';
import { AuditEvent, Membership, ReviewRequest, ReviewRequestReviewer, User } from '@/models';
import { apiRequest, createTestWorkspace, type TestWorkspace } from '../fixtures';
import { mailTo } from '../mail';
import {
  askForReview,
  box,
  circuitReviews,
  compareLink,
  decide,
  harrowLaneCircuit,
  person,
  requested,
  saveNewRevision,
  withdraw,
  type ErrorJson,
} from './review-helpers';

async function circuitApproval(userId: string, circuitId: string): Promise<unknown> {
  const response = await GET_CIRCUIT(await apiRequest(`/api/circuits/${circuitId}`, { userId }), { params: Promise.resolve({ id: circuitId }) });
  expect(response.status).toBe(200);
  return ((await response.json()) as { approval: unknown }).approval;
}

describe('review requests', () => {
  it('e-mails each named reviewer a link to the comparison, and files the request in both boxes', async () => {
    const ws = await createTestWorkspace('review-ask');
    const circuitId = await harrowLaneCircuit(ws);
    const reviewId = await requested(ws.users.engineer.id, circuitId, {
      revisionNumber: 1,
      reviewerIds: [ws.users.reviewer.id, ws.users.owner.id],
      message: '  Please check the press stroke against the guard  ',
    });

    const link = compareLink(circuitId, 1, reviewId);
    const engineer = await person(ws.users.engineer.id);
    for (const address of [ws.users.reviewer.email, ws.users.owner.email]) {
      const messages = await mailTo(address);
      expect(messages).toHaveLength(1);
      expect(messages[0]!.subject).toBe(`${engineer.name} asks you to check revision 1 of “Harrow Lane lid press”`);
      expect(messages[0]!.text).toContain(`Open the comparison: ${link}`);
      expect(messages[0]!.text).toContain('Their note: Please check the press stroke against the guard');
      expect(messages[0]!.text).toContain('never replace, a risk assessment');
      expect(messages[0]!.html).toContain(link.replace('&', '&amp;'));
    }
    expect(await mailTo(ws.users.technician.email)).toHaveLength(0);

    const audits = await AuditEvent.findAll({ where: { action: 'review.requested', targetId: reviewId } });
    expect(audits).toHaveLength(1);
    expect(audits[0]).toMatchObject({
      actorId: ws.users.engineer.id,
      workspaceId: ws.workspaceId,
      targetType: 'review_request',
      data: { circuitId, revisionNumber: 1, reviewerIds: [ws.users.reviewer.id, ws.users.owner.id] },
    });

    const waiting = await box(ws.users.reviewer.id, 'waiting');
    expect(waiting).toMatchObject({ total: 1, page: 1, pageSize: 20 });
    expect(waiting.items).toEqual([
      {
        id: reviewId,
        circuit: { id: circuitId, title: 'Harrow Lane lid press' },
        revisionNumber: 1,
        state: 'requested',
        stale: false,
        message: 'Please check the press stroke against the guard',
        requestedBy: engineer,
        // Sorted by name: the fixture names its users "<role> <suffix>".
        reviewers: [await person(ws.users.owner.id), await person(ws.users.reviewer.id)],
        createdAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT/),
        decidedBy: null,
        decidedAt: null,
        decisionNote: null,
      },
    ]);
    expect((await box(ws.users.owner.id, 'waiting')).items.map((r) => r.id)).toEqual([reviewId]);
    expect((await box(ws.users.engineer.id, 'requested')).items.map((r) => r.id)).toEqual([reviewId]);
    expect((await box(ws.users.engineer.id, 'waiting')).total).toBe(0);
    expect((await box(ws.users.reviewer.id, 'requested')).total).toBe(0);
  });

  it('approving tells the requester, shows in the history and gives the circuit its approval', async () => {
    const ws = await createTestWorkspace('review-approve');
    const circuitId = await harrowLaneCircuit(ws);
    const reviewId = await requested(ws.users.engineer.id, circuitId, { revisionNumber: 1, reviewerIds: [ws.users.reviewer.id], message: 'Ready for parts ordering' });
    expect(await circuitApproval(ws.users.viewer.id, circuitId)).toBeNull();

    const response = await decide(ws.users.reviewer.id, reviewId, { decision: 'approve', note: 'Stroke and guard clearances fit' });
    expect(response.status).toBe(200);
    const decided = (await response.json()) as { decidedAt: string };
    const reviewer = await person(ws.users.reviewer.id);
    expect(decided).toMatchObject({ id: reviewId, state: 'approved', stale: false, decidedBy: reviewer, decisionNote: 'Stroke and guard clearances fit' });

    const [mail] = await mailTo(ws.users.engineer.email);
    expect(mail!.subject).toBe(`${reviewer.name} approved revision 1 of “Harrow Lane lid press”`);
    expect(mail!.text).toContain('Their note: Stroke and guard clearances fit');
    expect(mail!.text).toContain(compareLink(circuitId, 1, reviewId));
    expect(await AuditEvent.count({ where: { action: 'review.approved', targetId: reviewId, actorId: ws.users.reviewer.id } })).toBe(1);

    expect(await circuitApproval(ws.users.viewer.id, circuitId)).toEqual({ revisionNumber: 1, decidedBy: reviewer, decidedAt: decided.decidedAt });
    const history = await LIST_REVISIONS(await apiRequest(`/api/circuits/${circuitId}/revisions`, { userId: ws.users.viewer.id }), { params: Promise.resolve({ id: circuitId }) });
    expect(((await history.json()) as { items: Array<{ review: unknown }> }).items[0]!.review).toEqual({
      id: reviewId,
      state: 'approved',
      stale: false,
      requestedBy: await person(ws.users.engineer.id),
      decidedBy: reviewer,
      decidedAt: decided.decidedAt,
    });
    expect((await box(ws.users.reviewer.id, 'waiting')).total).toBe(0);

    const again = await decide(ws.users.reviewer.id, reviewId, { decision: 'request_changes' });
    expect(again.status).toBe(409);
    expect(await again.json()).toMatchObject({ error: { code: 'conflict:review', message: 'This review request has already been decided' } });
    expect(await ReviewRequest.findByPk(reviewId)).toMatchObject({ state: 'approved', decisionNote: 'Stroke and guard clearances fit' });
  });

  it('asking for changes records the decision and tells the requester, but approves nothing', async () => {
    const ws = await createTestWorkspace('review-changes');
    const circuitId = await harrowLaneCircuit(ws);
    const reviewId = await requested(ws.users.engineer.id, circuitId, { revisionNumber: 1, reviewerIds: [ws.users.reviewer.id], message: 'First look' });

    const response = await decide(ws.users.reviewer.id, reviewId, { decision: 'request_changes', note: '   ' });
    expect(response.status).toBe(200);
    const reviewer = await person(ws.users.reviewer.id);
    expect(await response.json()).toMatchObject({ state: 'changes_requested', decidedBy: reviewer, decisionNote: null });

    const [mail] = await mailTo(ws.users.engineer.email);
    expect(mail!.subject).toBe(`${reviewer.name} asks for changes to revision 1 of “Harrow Lane lid press”`);
    expect(mail!.text).not.toContain('Their note');
    expect(await AuditEvent.count({ where: { action: 'review.changes_requested', targetId: reviewId } })).toBe(1);
    expect(await circuitApproval(ws.users.engineer.id, circuitId)).toBeNull();
  });

  it('lets no technician, engineer or reviewer who was not asked decide', async () => {
    const ws = await createTestWorkspace('review-who');
    const circuitId = await harrowLaneCircuit(ws);
    const reviewId = await requested(ws.users.engineer.id, circuitId, { revisionNumber: 1, reviewerIds: [ws.users.owner.id], message: 'Owner only' });

    for (const [userId, message] of [
      [ws.users.technician.id, 'Your role (technician) may not decide review'],
      [ws.users.engineer.id, 'Your role (engineer) may not decide review'],
      [ws.users.reviewer.id, 'Only a reviewer named on this request may decide it'],
    ] as const) {
      const response = await decide(userId, reviewId, { decision: 'approve' });
      expect(response.status).toBe(403);
      expect(await response.json()).toEqual({ error: { code: 'forbidden:review', message } });
    }
    expect(await ReviewRequest.findByPk(reviewId)).toMatchObject({ state: 'requested', decidedById: null, decidedAt: null });
    expect(await AuditEvent.count({ where: { action: ['review.approved', 'review.changes_requested'], targetId: reviewId } })).toBe(0);
    expect(await mailTo(ws.users.engineer.email)).toHaveLength(0);
  });

  it('a newer revision makes approvals and open requests stale: the circuit loses its approval and stale requests cannot be decided', async () => {
    const ws = await createTestWorkspace('review-stale');
    const circuitId = await harrowLaneCircuit(ws);
    const approved = await requested(ws.users.engineer.id, circuitId, { revisionNumber: 1, reviewerIds: [ws.users.reviewer.id], message: 'A' });
    expect((await decide(ws.users.reviewer.id, approved, { decision: 'approve' })).status).toBe(200);
    const turnedDown = await requested(ws.users.engineer.id, circuitId, { revisionNumber: 1, reviewerIds: [ws.users.reviewer.id], message: 'B' });
    expect((await decide(ws.users.reviewer.id, turnedDown, { decision: 'request_changes' })).status).toBe(200);
    const open = await requested(ws.users.engineer.id, circuitId, { revisionNumber: 1, reviewerIds: [ws.users.owner.id], message: 'C' });
    expect(await circuitApproval(ws.users.viewer.id, circuitId)).toMatchObject({ revisionNumber: 1 });

    expect(await saveNewRevision(ws, circuitId, 'Longer stroke')).toBe(2);

    expect(await circuitApproval(ws.users.viewer.id, circuitId)).toBeNull();
    const listed = await circuitReviews(ws.users.viewer.id, circuitId);
    expect(listed.map((r) => [r.id, r.state, r.stale])).toEqual([
      [open, 'requested', true],
      [turnedDown, 'changes_requested', false],
      [approved, 'approved', true],
    ]);
    const stored = await ReviewRequest.findAll({ where: { circuitId }, order: [['createdAt', 'ASC']] });
    expect(stored.map((r) => r.staleAt !== null)).toEqual([true, false, true]);

    const late = await decide(ws.users.owner.id, open, { decision: 'approve' });
    expect(late.status).toBe(409);
    expect(await late.json()).toMatchObject({ error: { code: 'conflict:review', message: 'Revision 1 is no longer the newest; a review of the newest revision has to be requested' } });
    expect((await box(ws.users.owner.id, 'waiting')).total).toBe(0);

    const outdated = await askForReview(ws.users.engineer.id, circuitId, { revisionNumber: 1, reviewerIds: [ws.users.reviewer.id], message: 'Old one' });
    expect(outdated.status).toBe(409);
    expect(await outdated.json()).toMatchObject({ error: { code: 'conflict:revision', field: 'revisionNumber' } });

    const fresh = await requested(ws.users.engineer.id, circuitId, { revisionNumber: 2, reviewerIds: [ws.users.reviewer.id], message: 'D' });
    expect((await decide(ws.users.reviewer.id, fresh, { decision: 'approve' })).status).toBe(200);
    expect(await circuitApproval(ws.users.viewer.id, circuitId)).toMatchObject({ revisionNumber: 2, decidedBy: await person(ws.users.reviewer.id) });
  });

  it('the requester or an owner withdraws an undecided request, once; nobody else may', async () => {
    const ws = await createTestWorkspace('review-withdraw');
    const circuitId = await harrowLaneCircuit(ws);
    const mine = await requested(ws.users.engineer.id, circuitId, { revisionNumber: 1, reviewerIds: [ws.users.reviewer.id], message: 'Mine' });

    const byReviewer = await withdraw(ws.users.reviewer.id, mine);
    expect(byReviewer.status).toBe(403);
    const ownersRequest = await requested(ws.users.owner.id, circuitId, { revisionNumber: 1, reviewerIds: [ws.users.reviewer.id], message: 'Theirs' });
    const byOtherEngineer = await withdraw(ws.users.engineer.id, ownersRequest);
    expect(byOtherEngineer.status).toBe(403);
    expect(await byOtherEngineer.json()).toMatchObject({ error: { code: 'forbidden:review', message: 'Only whoever asked for this review may withdraw it' } });

    const response = await withdraw(ws.users.engineer.id, mine);
    expect(response.status).toBe(200);
    expect(await response.json()).toMatchObject({ id: mine, state: 'withdrawn', decidedBy: null, decidedAt: null });
    expect(await AuditEvent.count({ where: { action: 'review.withdrawn', targetId: mine, actorId: ws.users.engineer.id } })).toBe(1);
    expect((await box(ws.users.reviewer.id, 'waiting')).items.map((r) => r.id)).toEqual([ownersRequest]);

    const again = await withdraw(ws.users.engineer.id, mine);
    expect(again.status).toBe(409);
    expect(await again.json()).toMatchObject({ error: { code: 'conflict:review', message: 'This review request was already withdrawn' } });
    const late = await decide(ws.users.reviewer.id, mine, { decision: 'approve' });
    expect(late.status).toBe(409);
    expect(await late.json()).toMatchObject({ error: { code: 'conflict:review', message: 'This review request was withdrawn' } });

    expect((await withdraw(ws.users.owner.id, ownersRequest)).status).toBe(200);
    const decidedOne = await requested(ws.users.engineer.id, circuitId, { revisionNumber: 1, reviewerIds: [ws.users.reviewer.id], message: 'Decided' });
    expect((await decide(ws.users.reviewer.id, decidedOne, { decision: 'approve' })).status).toBe(200);
    expect((await withdraw(ws.users.engineer.id, decidedOne)).status).toBe(409);
    // An owner may take back anyone's request.
    const forOwner = await requested(ws.users.engineer.id, circuitId, { revisionNumber: 1, reviewerIds: [ws.users.reviewer.id], message: 'Owner tidies' });
    expect((await withdraw(ws.users.owner.id, forOwner)).status).toBe(200);
  });

  it('answers 404 for a request of another workspace', async () => {
    const ws = await createTestWorkspace('review-scope');
    const other = await createTestWorkspace('review-scope-other');
    const circuitId = await harrowLaneCircuit(ws);
    const reviewId = await requested(ws.users.engineer.id, circuitId, { revisionNumber: 1, reviewerIds: [ws.users.reviewer.id], message: 'Scoped' });
    const response = await decide(other.users.owner.id, reviewId, { decision: 'approve' });
    expect(response.status).toBe(404);
    expect(await response.json()).toMatchObject({ error: { code: 'not_found:review' } });
    expect((await box(other.users.owner.id, 'waiting')).total).toBe(0);
  });

  describe('a refused request writes nothing and sends nothing', () => {
    it.each([
      ['an unknown user', (ws: TestWorkspace) => [ws.users.reviewer.id, randomUUID()], 'is not a member of this workspace'],
      ['a technician', (ws: TestWorkspace) => [ws.users.reviewer.id, ws.users.technician.id], 'is technician here and may not decide reviews'],
      ['the requester', (ws: TestWorkspace) => [ws.users.reviewer.id, ws.users.engineer.id], 'ask someone other than yourself'],
      ['the same reviewer twice', (ws: TestWorkspace) => [ws.users.reviewer.id, ws.users.reviewer.id], 'name each reviewer once'],
      ['no reviewer', () => [], 'name at least one reviewer'],
      ['eleven reviewers', () => Array.from({ length: 11 }, () => randomUUID()), 'at most 10 reviewers'],
    ])('reviewerIds with %s: 400 on reviewerIds', async (_label, ids, message) => {
      const ws = await createTestWorkspace('review-refused');
      const circuitId = await harrowLaneCircuit(ws);
      const response = await askForReview(ws.users.engineer.id, circuitId, { revisionNumber: 1, reviewerIds: ids(ws), message: 'Check it' });
      expect(response.status).toBe(400);
      const json = (await response.json()) as ErrorJson;
      expect(json.error).toMatchObject({ code: 'invalid:reviewerIds', field: 'reviewerIds' });
      expect(json.error.message).toContain(message);
      expect(await ReviewRequest.count({ where: { circuitId } })).toBe(0);
      expect(await AuditEvent.count({ where: { action: 'review.requested', workspaceId: ws.workspaceId } })).toBe(0);
      expect(await mailTo(ws.users.reviewer.email)).toHaveLength(0);
    });

    it('refuses a member of another workspace, a missing revision and a blank message', async () => {
      const ws = await createTestWorkspace('review-refused-more');
      const other = await createTestWorkspace('review-refused-other');
      const circuitId = await harrowLaneCircuit(ws);
      const cases: Array<[object, number, string, string]> = [
        [{ revisionNumber: 1, reviewerIds: [other.users.reviewer.id], message: 'Outsider' }, 400, 'invalid:reviewerIds', 'reviewerIds'],
        [{ revisionNumber: 7, reviewerIds: [ws.users.reviewer.id], message: 'No such revision' }, 404, 'not_found:revision', 'revisionNumber'],
        [{ revisionNumber: 1, reviewerIds: [ws.users.reviewer.id], message: '   ' }, 400, 'invalid:message', 'message'],
      ];
      for (const [body, status, code, field] of cases) {
        const response = await askForReview(ws.users.engineer.id, circuitId, body);
        expect(response.status).toBe(status);
        expect(await response.json()).toMatchObject({ error: { code, field } });
      }
      expect(await ReviewRequest.count({ where: { circuitId } })).toBe(0);
      expect(await ReviewRequestReviewer.count({ where: { reviewerId: [ws.users.reviewer.id, other.users.reviewer.id] } })).toBe(0);
      expect(await mailTo(other.users.reviewer.email)).toHaveLength(0);
      expect(await mailTo(ws.users.reviewer.email)).toHaveLength(0);
    });

    it('takes a reviewer whose role changed to engineer for unfit', async () => {
      const ws = await createTestWorkspace('review-demoted');
      const circuitId = await harrowLaneCircuit(ws);
      await Membership.update({ role: 'engineer' }, { where: { userId: ws.users.reviewer.id, workspaceId: ws.workspaceId } });
      const name = (await User.findByPk(ws.users.reviewer.id, { rejectOnEmpty: true })).name;
      const response = await askForReview(ws.users.owner.id, circuitId, { revisionNumber: 1, reviewerIds: [ws.users.reviewer.id], message: 'Check it' });
      expect(response.status).toBe(400);
      expect(await response.json()).toEqual({ error: { code: 'invalid:reviewerIds', message: `reviewerIds: ${name} is engineer here and may not decide reviews`, field: 'reviewerIds' } });
    });
  });
});
