import { Migration } from '@mikro-orm/migrations';

/**
 * Solver jobs: learn jobs (one per tissue profile), what a learned profile holds for the library
 * (spectra, drivers, source joints), and a retarget job's joint map and base take.
 */
export class Migration20261215000000_solver_jobs extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      "create table `learn_jobs` (`id` varchar(36) not null, `show_id` varchar(36) not null, `profile_id` varchar(36) not null, `settings` json not null, `state` enum('queued', 'solving', 'solved', 'failed', 'canceled') not null, `stage` varchar(60) null, `percent` int not null, `attempts` int not null, `error_code` varchar(60) null, `error_message` text null, `submitted_by_id` varchar(36) null, `worker` varchar(120) null, `created_at` datetime not null, `started_at` datetime null, `finished_at` datetime null, primary key (`id`)) default character set utf8mb4 engine = InnoDB;",
    );
    this.addSql('alter table `learn_jobs` add index `learn_jobs_show_id_index`(`show_id`);');
    this.addSql(
      'alter table `learn_jobs` add unique `learn_jobs_profile_id_unique`(`profile_id`);',
    );
    this.addSql(
      'alter table `learn_jobs` add index `learn_jobs_submitted_by_id_index`(`submitted_by_id`);',
    );
    this.addSql(
      'alter table `learn_jobs` add index `learn_jobs_show_id_created_at_index`(`show_id`, `created_at`);',
    );
    this.addSql(
      'alter table `learn_jobs` add index `learn_jobs_show_id_state_index`(`show_id`, `state`);',
    );
    this.addSql(
      'alter table `learn_jobs` add constraint `learn_jobs_show_id_foreign` foreign key (`show_id`) references `shows` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `learn_jobs` add constraint `learn_jobs_profile_id_foreign` foreign key (`profile_id`) references `tissue_profiles` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `learn_jobs` add constraint `learn_jobs_submitted_by_id_foreign` foreign key (`submitted_by_id`) references `users` (`id`) on update cascade on delete set null;',
    );
    this.addSql(
      'alter table `tissue_profiles` add `spectra` json null, add `drivers` json null, add `source_joints` json null;',
    );
    this.addSql(
      'alter table `retarget_jobs` add `joint_map` json null, add `base_take_id` varchar(36) null;',
    );
    this.addSql(
      'alter table `retarget_jobs` add constraint `retarget_jobs_base_take_id_foreign` foreign key (`base_take_id`) references `takes` (`id`) on update cascade on delete set null;',
    );
    this.addSql(
      'alter table `retarget_jobs` add index `retarget_jobs_base_take_id_index`(`base_take_id`);',
    );
    this.addSql(
      'alter table `retarget_jobs` add index `retarget_jobs_show_id_created_at_index`(`show_id`, `created_at`);',
    );
  }

  override async down(): Promise<void> {
    this.addSql(
      'alter table `retarget_jobs` drop foreign key `retarget_jobs_base_take_id_foreign`;',
    );
    this.addSql('alter table `retarget_jobs` drop index `retarget_jobs_base_take_id_index`;');
    this.addSql('alter table `retarget_jobs` drop index `retarget_jobs_show_id_created_at_index`;');
    this.addSql('alter table `retarget_jobs` drop column `joint_map`, drop column `base_take_id`;');
    this.addSql(
      'alter table `tissue_profiles` drop column `spectra`, drop column `drivers`, drop column `source_joints`;',
    );
    this.addSql('drop table if exists `learn_jobs`;');
  }
}
