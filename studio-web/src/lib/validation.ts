// Checks the forms run before sending, with messages that say what to fix. The API checks again.

/** Shortest password the API accepts. */
export const MIN_PASSWORD_LENGTH = 12;

/** Longest password the API accepts. */
export const MAX_PASSWORD_LENGTH = 256;

/** A field's problem in words, or null when it is fine. */
export type FieldError = string | null;

/** Field name → its problem; only fields with a problem appear. */
export type FormErrors<K extends string> = Partial<Record<K, string>>;

// The shape browsers use for type="email": something@something, no spaces.
const EMAIL = /^[^\s@]+@[^\s@]+$/;

/** An e-mail address is required and must look like one. */
export function checkEmail(value: string): FieldError {
  const email = value.trim();
  if (email === '') return 'Enter an e-mail address.';
  if (email.length > 254) return 'An e-mail address has at most 254 characters.';
  if (!EMAIL.test(email)) return 'Enter an e-mail address such as name@studio.example.';
  return null;
}

/** A password to sign in with: anything but empty. */
export function checkPasswordPresent(value: string): FieldError {
  return value === '' ? 'Enter your password.' : null;
}

/** A new password: long enough, not too long. */
export function checkNewPassword(value: string): FieldError {
  if (value.length < MIN_PASSWORD_LENGTH) {
    return `Choose a password of at least ${MIN_PASSWORD_LENGTH} characters.`;
  }
  if (value.length > MAX_PASSWORD_LENGTH) {
    return `A password has at most ${MAX_PASSWORD_LENGTH} characters.`;
  }
  return null;
}

/** The repeated password must match the first. */
export function checkRepeat(password: string, repeat: string): FieldError {
  return password === repeat ? null : 'The two passwords differ.';
}

/** A required text of at most `max` characters; `what` names it in the message. */
export function checkText(value: string, what: string, max: number): FieldError {
  const text = value.trim();
  if (text === '') return `Enter ${what}.`;
  if (text.length > max)
    return `${what[0].toUpperCase()}${what.slice(1)} has at most ${max} characters.`;
  return null;
}

/** Keeps only the fields that have a problem. */
export function collectErrors<K extends string>(checks: Record<K, FieldError>): FormErrors<K> {
  const errors: FormErrors<K> = {};
  for (const key of Object.keys(checks) as K[]) {
    const message = checks[key];
    if (message) errors[key] = message;
  }
  return errors;
}

/** True when a form has no problems. */
export function isValid<K extends string>(errors: FormErrors<K>): boolean {
  return Object.keys(errors).length === 0;
}
