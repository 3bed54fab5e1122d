import { Migration } from '@mikro-orm/migrations';

const STATES = "enum('queued', 'solving', 'solved', 'failed', 'canceled')";

/**
 * Job rows get the database defaults their entity gives (queued, 0 %, no attempts yet), now that
 * both kinds of job share one declaration of those columns.
 */
export class Migration20261216000000_job_defaults extends Migration {
  override async up(): Promise<void> {
    for (const table of ['learn_jobs', 'retarget_jobs']) {
      this.addSql(
        `alter table \`${table}\` modify \`state\` ${STATES} not null default 'queued', modify \`percent\` int not null default 0, modify \`attempts\` int not null default 0;`,
      );
    }
  }

  override async down(): Promise<void> {
    for (const table of ['learn_jobs', 'retarget_jobs']) {
      this.addSql(
        `alter table \`${table}\` modify \`state\` ${STATES} not null, modify \`percent\` int not null, modify \`attempts\` int not null;`,
      );
    }
  }
}
