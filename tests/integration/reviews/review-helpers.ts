import { expect } from 'vitest';
import { POST as SAVE } from '@/app/api/circuits/[id]/revisions/route';
import { GET as CIRCUIT_REVIEWS, POST as REQUEST } from '@/app/api/circuits/[id]/reviews/route';
import { POST as DECIDE } from '@/app/api/reviews/[id]/decision/route';
import { POST as WITHDRAW } from '@/app/api/reviews/[id]/withdraw/route';
import { GET as BOX } from '@/app/api/reviews/route';
import { createCircuit } from '@/lib/circuits/create-circuit';
import type { ReviewView } from '@/lib/reviews/review-view';
import { Circuit, User } from '@/models';
import { apiRequest, type TestWorkspace } from '../fixtures';

export interface ErrorJson {
  error: { code: string; message: string; field?: string };
}

const params = <P extends Record<string, string>>(p: P) => ({ params: Promise.resolve(p) });

/** A circuit of the fictional Harrow Lane plant, with its first revision saved by the workspace's engineer. */
export async function harrowLaneCircuit(ws: TestWorkspace, title = 'Harrow Lane lid press'): Promise<string> {
  const created = await createCircuit({ workspaceId: ws.workspaceId, authorId: ws.users.engineer.id, input: { title, description: '', message: 'First drawing' } });
  return created.id;
}

export async function person(userId: string): Promise<{ id: string; name: string }> {
  const user = await User.findByPk(userId, { rejectOnEmpty: true });
  return { id: user.id, name: user.name };
}

export async function askForReview(userId: string, circuitId: string, body: object): Promise<Response> {
  return REQUEST(await apiRequest(`/api/circuits/${circuitId}/reviews`, { userId, method: 'POST', body }), params({ id: circuitId }));
}

/** Asks for a review and expects it to be created; returns the request's id. */
export async function requested(userId: string, circuitId: string, body: object): Promise<string> {
  const response = await askForReview(userId, circuitId, body);
  expect(response.status, await response.clone().text()).toBe(201);
  return ((await response.json()) as { id: string }).id;
}

export async function decide(userId: string, reviewId: string, body: object): Promise<Response> {
  return DECIDE(await apiRequest(`/api/reviews/${reviewId}/decision`, { userId, method: 'POST', body }), params({ id: reviewId }));
}

export async function withdraw(userId: string, reviewId: string): Promise<Response> {
  return WITHDRAW(await apiRequest(`/api/reviews/${reviewId}/withdraw`, { userId, method: 'POST' }), params({ id: reviewId }));
}

export async function box(userId: string, which: 'waiting' | 'requested'): Promise<{ items: ReviewView[]; total: number; page: number; pageSize: number }> {
  const response = await BOX(await apiRequest(`/api/reviews?box=${which}`, { userId }), {} as never);
  expect(response.status).toBe(200);
  return (await response.json()) as { items: ReviewView[]; total: number; page: number; pageSize: number };
}

export async function circuitReviews(userId: string, circuitId: string): Promise<ReviewView[]> {
  const response = await CIRCUIT_REVIEWS(await apiRequest(`/api/circuits/${circuitId}/reviews`, { userId }), params({ id: circuitId }));
  expect(response.status).toBe(200);
  return ((await response.json()) as { items: ReviewView[] }).items;
}

/** Saves the circuit's current document again as a new revision, as the engineer. */
export async function saveNewRevision(ws: TestWorkspace, circuitId: string, message: string): Promise<number> {
  const circuit = await Circuit.findByPk(circuitId, { rejectOnEmpty: true });
  const body = { document: { schemaVersion: 1 }, message, expectedLockVersion: circuit.lockVersion };
  const response = await SAVE(await apiRequest(`/api/circuits/${circuitId}/revisions`, { userId: ws.users.engineer.id, method: 'POST', body }), params({ id: circuitId }));
  expect(response.status).toBe(201);
  return ((await response.json()) as { number: number }).number;
}

/** The address a review e-mail links to. */
export function compareLink(circuitId: string, revisionNumber: number, reviewId: string): string {
  return new URL(`/circuits/${circuitId}/compare?to=${revisionNumber}&review=${reviewId}`, process.env.APP_URL).toString();
}
