/** Every queue of the product, by name. */
export const QUEUES = {
  diagnostics: 'diagnostics',
  mail: 'mail',
  ingest: 'ingest',
  learn: 'learn',
  retarget: 'retarget',
} as const;
