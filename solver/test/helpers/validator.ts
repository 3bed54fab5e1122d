// Test helper: run the Khronos glTF validator (npm gltf-validator) on bytes.
import { validateBytes } from 'gltf-validator';

/** Errors reported by the validator (empty when the file is valid). */
export async function validatorErrors(bytes: Uint8Array): Promise<string[]> {
  const report = await validateBytes(bytes, { maxIssues: 50 });
  return report.issues.messages
    .filter((m) => m.severity === 0)
    .map((m) => `${m.code} ${m.pointer ?? ''}: ${m.message}`);
}
