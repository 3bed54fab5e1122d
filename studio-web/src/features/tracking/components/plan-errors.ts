// The API's refusals of a shot update, spread over the dialog's fields: VALIDATION_FAILED details
// and SHOT_ASSIGNEE_INVALID under their field, a refused render move under the render state,
// anything else for the callout under the form.
import { fieldErrorMap } from '@/features/library/api/field-errors';
import { ApiError } from '@/lib/api-client';
import { isOneOf, RENDER_STATE_WORDS, RENDER_STATES } from '@/lib/shot-states';

/** The dialog's fields. */
export type PlanField = 'dueDate' | 'assigneeIds' | 'renderState';

/** Problems per field, and what belongs to no field. */
export interface PlanErrors {
  fields: Partial<Record<PlanField, string>>;
  rest: unknown;
}

const stateWord = (s: unknown) => (isOneOf(RENDER_STATES, s) ? RENDER_STATE_WORDS[s] : String(s));

/** A refused render move in words, with the moves that are allowed from there. */
export function renderMoveSentence(error: ApiError): string {
  const d = (error.details ?? {}) as { from?: unknown; to?: unknown; allowed?: unknown };
  const allowed = Array.isArray(d.allowed) ? d.allowed.map(stateWord) : [];
  const from = stateWord(d.from);
  const to = stateWord(d.to);
  const next = allowed.length ? ` From ${from} it can go to ${allowed.join(' or ')}.` : '';
  return `The render state cannot go from ${from} to ${to}.${next}`;
}

/** Spreads the errors of the plan (PATCH) and render (PUT) requests over the fields. */
export function planErrors(planError: unknown, renderError: unknown): PlanErrors {
  const fields: Partial<Record<PlanField, string>> = {};
  let rest: unknown = null;
  if (planError) {
    Object.assign(fields, fieldErrorMap(planError, ['dueDate', 'assigneeIds'] as const));
    if (planError instanceof ApiError && planError.code === 'SHOT_ASSIGNEE_INVALID') {
      fields.assigneeIds = planError.message;
    }
    if (!fields.dueDate && !fields.assigneeIds) rest = planError;
  }
  if (renderError) {
    if (renderError instanceof ApiError && renderError.code === 'RENDER_STATE_INVALID_TRANSITION') {
      fields.renderState = renderMoveSentence(renderError);
    } else {
      const state = fieldErrorMap(renderError, ['state'] as const).state;
      if (state) fields.renderState = state;
      else rest ??= renderError;
    }
  }
  return { fields, rest };
}
