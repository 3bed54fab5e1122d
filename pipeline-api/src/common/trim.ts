import { Transform } from 'class-transformer';

/** Trims surrounding space from a string field before it is validated (pasted addresses). */
export const Trim = () =>
  Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value));
