// Minimal types for the Khronos validator's npm build, which ships none.
declare module 'gltf-validator' {
  /** One issue found by the validator; severity 0 is an error. */
  export interface ValidatorMessage {
    code: string;
    message: string;
    severity: number;
    pointer?: string;
  }
  /** Validation report. */
  export interface ValidatorReport {
    issues: { numErrors: number; numWarnings: number; messages: ValidatorMessage[] };
  }
  /** Validates GLB or glTF bytes. */
  export function validateBytes(
    data: Uint8Array,
    options?: { maxIssues?: number; uri?: string },
  ): Promise<ValidatorReport>;
}
