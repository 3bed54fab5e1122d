// Whole-object reads and writes of the solver's files (inputs to download, a profile or take to
// store), on the process's one S3 client.
import { PutObjectCommand } from '@aws-sdk/client-s3';
import type { StorageService } from '../../storage/storage.service';

/** The object's bytes. */
export async function readObject(storage: StorageService, key: string): Promise<Uint8Array> {
  const chunks: Buffer[] = [];
  for await (const chunk of await storage.stream(key)) chunks.push(chunk as Buffer);
  return new Uint8Array(Buffer.concat(chunks));
}

/** Writes the object (again is harmless: same key, same bytes). */
export async function writeObject(
  storage: StorageService,
  key: string,
  bytes: Uint8Array,
  contentType: string,
): Promise<void> {
  await storage.client.send(
    new PutObjectCommand({
      Bucket: storage.bucket,
      Key: key,
      Body: bytes,
      ContentType: contentType,
    }),
  );
}

/** The file a job writes: a take (retarget) or a profile (learn). */
export type JobOutputFile = 'take.glb' | 'profile.ovsp';

/** Where a job's output goes: derived from the job id, so every attempt writes the same key. */
export const jobObjectKey = (showId: string, jobId: string, file: JobOutputFile) =>
  `shows/${showId}/jobs/${jobId}/${file}`;
