// What each backing service is called on screen, and what Overshoot uses it for.
import type { ServiceName } from '../api/health-report';

/** Display name and purpose of each backing service. */
export const SERVICE_LABELS: Record<ServiceName, { label: string; purpose: string }> = {
  db: { label: 'Database (MariaDB)', purpose: 'Shows, shots, takes, notes and users' },
  redis: { label: 'Queues (Redis)', purpose: 'Ingest, learning, retarget and mail jobs' },
  s3: { label: 'File store (S3)', purpose: 'Uploaded assets and produced takes' },
  smtp: { label: 'Mail (SMTP)', purpose: 'Review and invitation e-mails' },
};
