// Migrations in the order they apply. Add each new migration here (an explicit list works the
// same from compiled JavaScript and from TypeScript under the test runner).
import { Migration20261201000000_users } from './Migration20261201000000_users';
import { Migration20261202000000_accounts } from './Migration20261202000000_accounts';
import { Migration20261203000000_library } from './Migration20261203000000_library';
import { Migration20261204000000_production } from './Migration20261204000000_production';
import { Migration20261205000000_shot_list_indexes } from './Migration20261205000000_shot_list_indexes';
import { Migration20261215000000_solver_jobs } from './Migration20261215000000_solver_jobs';
import { Migration20261216000000_job_defaults } from './Migration20261216000000_job_defaults';

/** Every migration, oldest first. */
export const MIGRATIONS = [
  { name: 'Migration20261201000000_users', class: Migration20261201000000_users },
  { name: 'Migration20261202000000_accounts', class: Migration20261202000000_accounts },
  { name: 'Migration20261203000000_library', class: Migration20261203000000_library },
  { name: 'Migration20261204000000_production', class: Migration20261204000000_production },
  {
    name: 'Migration20261205000000_shot_list_indexes',
    class: Migration20261205000000_shot_list_indexes,
  },
  { name: 'Migration20261215000000_solver_jobs', class: Migration20261215000000_solver_jobs },
  { name: 'Migration20261216000000_job_defaults', class: Migration20261216000000_job_defaults },
];
