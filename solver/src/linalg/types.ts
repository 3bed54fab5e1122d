// Numeric array types accepted by the in-place linear algebra helpers.

/** Any writable array of numbers: Float32Array, Float64Array or number[]. */
export type NumArray = Float32Array | Float64Array | number[];
