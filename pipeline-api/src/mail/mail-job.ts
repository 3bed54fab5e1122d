import type { Job } from 'bullmq';

/** One e-mail for the worker to send; `emailId` is its EmailMessage record. */
export interface MailJobData {
  emailId: string;
  to: string;
  subject: string;
  text: string;
}

/** A job of the `mail` queue. */
export type MailJob = Job<MailJobData, void, 'send'>;
