import { afterEach, describe, expect, it, vi } from 'vitest';
import { sendMail } from '@/lib/mail/mailer';
import { AuditEvent, ReviewRequest, ReviewRequestReviewer } from '@/models';
import { createTestWorkspace } from '../fixtures';
import { mailTo } from '../mail';
import { askForReview, decide, harrowLaneCircuit, requested } from './review-helpers';

// The real mailer, with a way to make the mail server refuse one message.
vi.mock('@/lib/mail/mailer', async (importOriginal) => {
  const actual = await importOriginal<typeof import('@/lib/mail/mailer')>();
  return { ...actual, sendMail: vi.fn(actual.sendMail) };
});

function refuseNextMail(): void {
  vi.mocked(sendMail).mockRejectedValueOnce(new Error('550 mailbox unavailable'));
}

describe('when the mail server refuses', () => {
  afterEach(() => {
    vi.mocked(sendMail).mockClear();
  });

  it('a review request is rolled back: no request, no reviewers, no audit event', async () => {
    const ws = await createTestWorkspace('review-mail-down');
    const circuitId = await harrowLaneCircuit(ws);
    refuseNextMail();
    const response = await askForReview(ws.users.engineer.id, circuitId, { revisionNumber: 1, reviewerIds: [ws.users.reviewer.id], message: 'Check the press' });
    expect(response.status).toBe(500);
    expect(await response.json()).toEqual({ error: { code: 'internal:server', message: 'Something went wrong on the server' } });
    expect(await ReviewRequest.count({ where: { circuitId } })).toBe(0);
    expect(await ReviewRequestReviewer.count({ where: { reviewerId: ws.users.reviewer.id } })).toBe(0);
    expect(await AuditEvent.count({ where: { action: 'review.requested', workspaceId: ws.workspaceId } })).toBe(0);
    expect(await mailTo(ws.users.reviewer.email)).toHaveLength(0);
  });

  it('a decision is rolled back: the request stays open for the reviewer to decide again', async () => {
    const ws = await createTestWorkspace('review-mail-down-decide');
    const circuitId = await harrowLaneCircuit(ws);
    const reviewId = await requested(ws.users.engineer.id, circuitId, { revisionNumber: 1, reviewerIds: [ws.users.reviewer.id], message: 'Check the press' });
    refuseNextMail();
    const response = await decide(ws.users.reviewer.id, reviewId, { decision: 'approve', note: 'Fine' });
    expect(response.status).toBe(500);
    expect(await ReviewRequest.findByPk(reviewId)).toMatchObject({ state: 'requested', decidedById: null, decidedAt: null, decisionNote: null });
    expect(await AuditEvent.count({ where: { action: 'review.approved', targetId: reviewId } })).toBe(0);

    expect((await decide(ws.users.reviewer.id, reviewId, { decision: 'approve', note: 'Fine' })).status).toBe(200);
    expect(await ReviewRequest.findByPk(reviewId)).toMatchObject({ state: 'approved', decisionNote: 'Fine' });
  });
});
