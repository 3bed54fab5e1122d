/** Every queue of the product, by name. */
export const QUEUES = {
  diagnostics: 'diagnostics',
} as const;
