import type { SavePlanInput } from '@shared/schemas/plans';
import type { SavedPlanSummary, SavedPlanView, SharedPlanView } from '@shared/types/plans';
import { http, request } from './http';

/** One saved plan, as the API answers. */
export interface PlanAnswer {
  plan: SavedPlanView;
}

/** The signed-in person's saved plans, most recently changed first. */
export function listPlans(): Promise<{ items: SavedPlanSummary[] }> {
  return http.get<{ items: SavedPlanSummary[] }>('/api/plans');
}

/** Open a saved plan with its planner input. */
export function getPlan(id: number): Promise<PlanAnswer> {
  return http.get<PlanAnswer>(`/api/plans/${id}`);
}

/** Save a new plan to the account. */
export function createPlan(body: SavePlanInput): Promise<PlanAnswer> {
  return http.post<PlanAnswer>('/api/plans', body);
}

/** Replace a saved plan's name and input. */
export function updatePlan(id: number, body: SavePlanInput): Promise<PlanAnswer> {
  return request<PlanAnswer>('PUT', `/api/plans/${id}`, { body });
}

/** Delete a saved plan (its share link stops working). */
export function deletePlan(id: number): Promise<void> {
  return http.delete<void>(`/api/plans/${id}`);
}

/** Turn the read-only share link on (a new link each time) or off. */
export function setPlanSharing(id: number, shared: boolean): Promise<PlanAnswer> {
  return http.post<PlanAnswer>(`/api/plans/${id}/share`, { shared });
}

/** Open a plan someone shared, by the token in its link; no sign-in needed. */
export function getSharedPlan(token: string): Promise<{ plan: SharedPlanView }> {
  return http.get<{ plan: SharedPlanView }>(`/api/shared-plans/${encodeURIComponent(token)}`);
}
