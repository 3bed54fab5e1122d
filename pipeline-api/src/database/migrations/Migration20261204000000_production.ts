import { Migration } from '@mikro-orm/migrations';

/** Production: shots and assignees, retarget jobs, takes, notes and review decisions. */
export class Migration20261204000000_production extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      "create table `shots` (`id` varchar(36) not null, `show_id` varchar(36) not null, `sequence` varchar(40) not null, `code` varchar(40) not null, `frame_start` int not null, `frame_end` int not null, `fps` double not null, `character_id` varchar(36) null, `clip_id` varchar(36) null, `due_date` date null, `render_state` enum('not_started', 'queued', 'rendering', 'rendered', 'failed') not null, `render_state_at` datetime null, `solve_state` enum('queued', 'solving', 'solved', 'failed', 'canceled') null, `review_state` enum('awaiting_review', 'approved', 'changes_requested') null, `latest_take_version` int null, `created_at` datetime not null, `updated_at` datetime not null, primary key (`id`)) default character set utf8mb4 engine = InnoDB;",
    );
    this.addSql('alter table `shots` add index `shots_show_id_index`(`show_id`);');
    this.addSql('alter table `shots` add index `shots_character_id_index`(`character_id`);');
    this.addSql('alter table `shots` add index `shots_clip_id_index`(`clip_id`);');
    this.addSql(
      'alter table `shots` add index `shots_show_id_due_date_index`(`show_id`, `due_date`);',
    );
    this.addSql(
      'alter table `shots` add index `shots_show_id_sequence_index`(`show_id`, `sequence`);',
    );
    this.addSql('alter table `shots` add unique `shots_show_id_code_unique`(`show_id`, `code`);');
    this.addSql(
      'create table `shot_assignees` (`shot_id` varchar(36) not null, `user_id` varchar(36) not null, primary key (`shot_id`, `user_id`)) default character set utf8mb4 engine = InnoDB;',
    );
    this.addSql(
      'alter table `shot_assignees` add index `shot_assignees_shot_id_index`(`shot_id`);',
    );
    this.addSql(
      'alter table `shot_assignees` add index `shot_assignees_user_id_index`(`user_id`);',
    );
    this.addSql(
      "create table `retarget_jobs` (`id` varchar(36) not null, `show_id` varchar(36) not null, `shot_id` varchar(36) not null, `profile_id` varchar(36) not null, `controls` json not null, `state` enum('queued', 'solving', 'solved', 'failed', 'canceled') not null, `stage` varchar(60) null, `percent` int not null, `attempts` int not null, `error_code` varchar(60) null, `error_message` text null, `submitted_by_id` varchar(36) null, `worker` varchar(120) null, `created_at` datetime not null, `started_at` datetime null, `finished_at` datetime null, primary key (`id`)) default character set utf8mb4 engine = InnoDB;",
    );
    this.addSql('alter table `retarget_jobs` add index `retarget_jobs_show_id_index`(`show_id`);');
    this.addSql('alter table `retarget_jobs` add index `retarget_jobs_shot_id_index`(`shot_id`);');
    this.addSql(
      'alter table `retarget_jobs` add index `retarget_jobs_profile_id_index`(`profile_id`);',
    );
    this.addSql(
      'alter table `retarget_jobs` add index `retarget_jobs_submitted_by_id_index`(`submitted_by_id`);',
    );
    this.addSql(
      'alter table `retarget_jobs` add index `retarget_jobs_show_id_state_index`(`show_id`, `state`);',
    );
    this.addSql(
      "create table `takes` (`id` varchar(36) not null, `show_id` varchar(36) not null, `shot_id` varchar(36) not null, `version` int not null, `job_id` varchar(36) not null, `controls` json not null, `metrics` json null, `files` json not null, `review_state` enum('awaiting_review', 'approved', 'changes_requested') not null, `created_by_id` varchar(36) null, `created_at` datetime not null, `reviewed_at` datetime null, primary key (`id`)) default character set utf8mb4 engine = InnoDB;",
    );
    this.addSql('alter table `takes` add index `takes_show_id_index`(`show_id`);');
    this.addSql('alter table `takes` add index `takes_shot_id_index`(`shot_id`);');
    this.addSql('alter table `takes` add unique `takes_job_id_unique`(`job_id`);');
    this.addSql('alter table `takes` add index `takes_created_by_id_index`(`created_by_id`);');
    this.addSql(
      'alter table `takes` add unique `takes_shot_id_version_unique`(`shot_id`, `version`);',
    );
    this.addSql(
      "create table `review_decisions` (`id` varchar(36) not null, `take_id` varchar(36) not null, `decision` enum('approved', 'changes_requested') not null, `comment` text null, `supervisor_id` varchar(36) not null, `at` datetime not null, primary key (`id`)) default character set utf8mb4 engine = InnoDB;",
    );
    this.addSql(
      'alter table `review_decisions` add index `review_decisions_take_id_index`(`take_id`);',
    );
    this.addSql(
      'alter table `review_decisions` add index `review_decisions_supervisor_id_index`(`supervisor_id`);',
    );
    this.addSql(
      'alter table `review_decisions` add index `review_decisions_decision_at_index`(`decision`, `at`);',
    );
    this.addSql(
      'create table `notes` (`id` varchar(36) not null, `take_id` varchar(36) not null, `frame` int not null, `text` text not null, `mark` json null, `author_id` varchar(36) not null, `resolved` tinyint(1) not null default false, `resolved_by_id` varchar(36) null, `resolved_at` datetime null, `created_at` datetime not null, `updated_at` datetime not null, primary key (`id`)) default character set utf8mb4 engine = InnoDB;',
    );
    this.addSql('alter table `notes` add index `notes_take_id_index`(`take_id`);');
    this.addSql('alter table `notes` add index `notes_author_id_index`(`author_id`);');
    this.addSql('alter table `notes` add index `notes_resolved_by_id_index`(`resolved_by_id`);');
    this.addSql('alter table `notes` add index `notes_take_id_frame_index`(`take_id`, `frame`);');
    this.addSql(
      'alter table `shots` add constraint `shots_show_id_foreign` foreign key (`show_id`) references `shows` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `shots` add constraint `shots_character_id_foreign` foreign key (`character_id`) references `characters` (`id`) on update cascade on delete set null;',
    );
    this.addSql(
      'alter table `shots` add constraint `shots_clip_id_foreign` foreign key (`clip_id`) references `clips` (`id`) on update cascade on delete set null;',
    );
    this.addSql(
      'alter table `shot_assignees` add constraint `shot_assignees_shot_id_foreign` foreign key (`shot_id`) references `shots` (`id`) on update cascade on delete cascade;',
    );
    this.addSql(
      'alter table `shot_assignees` add constraint `shot_assignees_user_id_foreign` foreign key (`user_id`) references `users` (`id`) on update cascade on delete cascade;',
    );
    this.addSql(
      'alter table `retarget_jobs` add constraint `retarget_jobs_show_id_foreign` foreign key (`show_id`) references `shows` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `retarget_jobs` add constraint `retarget_jobs_shot_id_foreign` foreign key (`shot_id`) references `shots` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `retarget_jobs` add constraint `retarget_jobs_profile_id_foreign` foreign key (`profile_id`) references `tissue_profiles` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `retarget_jobs` add constraint `retarget_jobs_submitted_by_id_foreign` foreign key (`submitted_by_id`) references `users` (`id`) on update cascade on delete set null;',
    );
    this.addSql(
      'alter table `takes` add constraint `takes_show_id_foreign` foreign key (`show_id`) references `shows` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `takes` add constraint `takes_shot_id_foreign` foreign key (`shot_id`) references `shots` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `takes` add constraint `takes_job_id_foreign` foreign key (`job_id`) references `retarget_jobs` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `takes` add constraint `takes_created_by_id_foreign` foreign key (`created_by_id`) references `users` (`id`) on update cascade on delete set null;',
    );
    this.addSql(
      'alter table `review_decisions` add constraint `review_decisions_take_id_foreign` foreign key (`take_id`) references `takes` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `review_decisions` add constraint `review_decisions_supervisor_id_foreign` foreign key (`supervisor_id`) references `users` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `notes` add constraint `notes_take_id_foreign` foreign key (`take_id`) references `takes` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `notes` add constraint `notes_author_id_foreign` foreign key (`author_id`) references `users` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `notes` add constraint `notes_resolved_by_id_foreign` foreign key (`resolved_by_id`) references `users` (`id`) on update cascade on delete set null;',
    );
  }

  override async down(): Promise<void> {
    // Children first: their foreign keys point at the tables after them.
    this.addSql('drop table if exists `review_decisions`;');
    this.addSql('drop table if exists `notes`;');
    this.addSql('drop table if exists `takes`;');
    this.addSql('drop table if exists `retarget_jobs`;');
    this.addSql('drop table if exists `shot_assignees`;');
    this.addSql('drop table if exists `shots`;');
  }
}
