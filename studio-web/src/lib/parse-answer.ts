// Small checks for API answers: each names the answer and the field that is missing or wrong,
// so a changed API shows up as a plain message instead of a crash deep inside a component.

/** A JSON object as read from an answer. */
export type Json = Record<string, unknown>;

/** The value as an object; throws a TypeError naming `what` otherwise. */
export function asObject(value: unknown, what: string): Json {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw new TypeError(`The ${what} answer is not an object.`);
  }
  return value as Json;
}

/** The value as an array; throws a TypeError naming `what` otherwise. */
export function asArray(value: unknown, what: string): unknown[] {
  if (!Array.isArray(value)) throw new TypeError(`The ${what} answer is not a list.`);
  return value;
}

/** A required non-empty string field. */
export function str(body: Json, key: string, what: string): string {
  const v = body[key];
  if (typeof v !== 'string' || v === '') {
    throw new TypeError(`The ${what} answer has no "${key}".`);
  }
  return v;
}

/** A required finite number field. */
export function num(body: Json, key: string, what: string): number {
  const v = body[key];
  if (typeof v !== 'number' || !Number.isFinite(v)) {
    throw new TypeError(`The ${what} answer has no number "${key}".`);
  }
  return v;
}

/** An optional string field: null when absent or not a string. */
export function optStr(body: Json, key: string): string | null {
  const v = body[key];
  return typeof v === 'string' ? v : null;
}

/** An optional number field: null when absent or not finite. */
export function optNum(body: Json, key: string): number | null {
  const v = body[key];
  return typeof v === 'number' && Number.isFinite(v) ? v : null;
}

/** An optional list of strings: null when absent. */
export function optStrings(body: Json, key: string): string[] | null {
  const v = body[key];
  return Array.isArray(v) ? v.filter((s): s is string => typeof s === 'string') : null;
}

/** A required field that must be one of `allowed`. */
export function oneOf<T extends string>(
  body: Json,
  key: string,
  allowed: readonly T[],
  what: string,
): T {
  const v = body[key];
  if (!allowed.includes(v as T)) {
    throw new TypeError(`The ${what} answer has an unknown ${key}: ${JSON.stringify(v)}.`);
  }
  return v as T;
}

/** `{ id, displayName }` of a person named in an answer. */
export function person(value: unknown, key: string, what: string) {
  const b = asObject(value, `${what} ${key}`);
  return { id: str(b, 'id', what), displayName: optStr(b, 'displayName') ?? '' };
}
