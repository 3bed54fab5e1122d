// Reading glTF-Transform accessors into plain typed arrays, with finiteness checks.
import type { Accessor } from '@gltf-transform/core';
import { SolverInputError } from '../errors.js';

const NORMALISED_DIVISOR: Record<number, number> = {
  5120: 127, // BYTE
  5121: 255, // UNSIGNED_BYTE
  5122: 32767, // SHORT
  5123: 65535, // UNSIGNED_SHORT
};

/** Accessor values as floats (normalised integers mapped to [0, 1] or [−1, 1]). */
export function accessorFloats(accessor: Accessor): Float32Array {
  const array = accessor.getArray();
  if (!array) return new Float32Array(accessor.getCount() * accessor.getElementSize());
  if (array instanceof Float32Array) return array;
  const out = new Float32Array(array.length);
  const div = accessor.getNormalized() ? (NORMALISED_DIVISOR[accessor.getComponentType()] ?? 1) : 1;
  for (let i = 0; i < array.length; i++) out[i] = Math.max(array[i] / div, -1);
  return out;
}

/** Throws NON_FINITE_VALUE naming the element (as vertex, frame or item) of the first bad value. */
export function assertFinite(
  values: ArrayLike<number>,
  elementSize: number,
  describe: (element: number) => { message: string; where: Record<string, string | number> },
): void {
  for (let i = 0; i < values.length; i++) {
    if (!Number.isFinite(values[i])) {
      const { message, where } = describe(Math.floor(i / elementSize));
      throw new SolverInputError('NON_FINITE_VALUE', message, where);
    }
  }
}

/** Integer accessor values (indices, joint ids) as a Uint32Array. */
export function accessorIntegers(accessor: Accessor): Uint32Array {
  const array = accessor.getArray();
  if (!array) return new Uint32Array(accessor.getCount() * accessor.getElementSize());
  if (array instanceof Uint32Array) return array;
  return Uint32Array.from(array);
}
