// What `npm test` hands to the cross-cutting tests.
import { join } from 'node:path';
import { ROOT } from '../../scripts/stack/config.ts';

/** Base URL of the API (serving the built web client) that `npm test` started. */
export const API_URL =
  process.env.OVERSHOOT_API_URL ?? `http://127.0.0.1:${process.env.TEST_API_PORT ?? '3010'}`;

/** Where screenshots and other test output go (git-ignored). */
export const ARTIFACTS_DIR = process.env.OVERSHOOT_ARTIFACTS_DIR ?? join(ROOT, 'test', 'artifacts');

/** The test profile's data directory. */
export const TEST_DATA_DIR = process.env.OVERSHOOT_TEST_DATA_DIR ?? join(ROOT, '.data', 'test');
