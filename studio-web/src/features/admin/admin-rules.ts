// Field checks of the admin forms, matching what the API accepts.
import type { FieldError } from '@/lib/validation';

// The API's rule for show codes: 2 to 16 letters, digits, - or _, starting with a letter or digit.
const SHOW_CODE = /^[A-Za-z0-9][A-Za-z0-9_-]{1,15}$/;

/** A show code. */
export function checkShowCode(value: string): FieldError {
  const code = value.trim();
  if (code === '') return 'Enter a code, e.g. HARBOR.';
  if (!SHOW_CODE.test(code)) {
    return 'A code has 2 to 16 letters, digits, - or _, and starts with a letter or digit.';
  }
  return null;
}

/** At least one item chosen from a list; `what` names the list. */
export function checkChosen(values: readonly string[], what: string): FieldError {
  return values.length ? null : `Choose at least one ${what}.`;
}
