// Types for the parts of the Khronos glTF validator (npm gltf-validator) the tests use.
declare module 'gltf-validator' {
  /** One reported issue; severity 0 is an error. */
  export interface ValidationMessage {
    code: string;
    message: string;
    severity: number;
    pointer?: string;
  }
  /** The validation report. */
  export interface ValidationReport {
    issues: { numErrors: number; numWarnings: number; messages: ValidationMessage[] };
  }
  /** Validates .glb bytes. */
  export function validateBytes(
    data: Uint8Array,
    options?: { maxIssues?: number; ignoredIssues?: string[] },
  ): Promise<ValidationReport>;
}
