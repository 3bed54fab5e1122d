// Reads the API's VALIDATION_FAILED details (`[{ field, problems }]`) so forms can show each
// problem under its own field.
import { ApiError } from '@/lib/api-client';

/** One field the API refused and why. */
export interface FieldProblem {
  field: string;
  problems: string[];
}

/** The per-field problems of a VALIDATION_FAILED answer; empty for any other error. */
export function fieldProblems(error: unknown): FieldProblem[] {
  if (!(error instanceof ApiError) || error.code !== 'VALIDATION_FAILED') return [];
  if (!Array.isArray(error.details)) return [];
  return error.details.flatMap((row: unknown) => {
    const r = (row ?? {}) as Record<string, unknown>;
    if (typeof r.field !== 'string') return [];
    const problems = Array.isArray(r.problems)
      ? r.problems.filter((p): p is string => typeof p === 'string')
      : [];
    return [{ field: r.field, problems }];
  });
}

/** Field name → its problems joined into one sentence, for the fields a form knows. */
export function fieldErrorMap<K extends string>(
  error: unknown,
  fields: readonly K[],
): Partial<Record<K, string>> {
  const map: Partial<Record<K, string>> = {};
  for (const { field, problems } of fieldProblems(error)) {
    // Nested fields (consent.scope) belong to their leaf where the form has it.
    const key = (fields as readonly string[]).includes(field)
      ? field
      : (field.split('.').pop() ?? field);
    if ((fields as readonly string[]).includes(key)) {
      const text = problems.join('; ') || 'This value was not accepted.';
      map[key as K] = map[key as K] ? `${map[key as K]}; ${text}` : text;
    }
  }
  return map;
}

/** An error in one sentence, with any field problems spelled out. */
export function errorSentence(error: unknown): string {
  const fields = fieldProblems(error);
  const base = error instanceof Error ? error.message : String(error);
  if (fields.length === 0) return base;
  return `${base} ${fields.map((f) => `${f.field}: ${f.problems.join('; ')}`).join('. ')}.`;
}
