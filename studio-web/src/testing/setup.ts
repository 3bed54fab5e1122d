// Runs before every test file: unmount what a test rendered so tests never see each other's DOM.
import { cleanup } from '@testing-library/react';
import { afterEach } from 'vitest';

afterEach(() => {
  cleanup();
});
