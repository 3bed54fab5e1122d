import { Migration } from '@mikro-orm/migrations';

/** Accounts and access: shows, memberships, sessions, password resets, invitations, pipeline
 * tokens, e-mail records and the audit trail. */
export class Migration20261202000000_accounts extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      'create table `audit_events` (`id` varchar(36) not null, `created_at` datetime not null, `actor_kind` varchar(16) not null, `actor_id` varchar(36) null, `actor_label` varchar(254) null, `action` varchar(60) not null, `object_type` varchar(40) null, `object_id` varchar(36) null, `show_id` varchar(36) null, `details` json null, `ip` varchar(64) null, primary key (`id`)) default character set utf8mb4 engine = InnoDB;',
    );
    this.addSql(
      'alter table `audit_events` add index `audit_events_object_type_object_id_index`(`object_type`, `object_id`);',
    );
    this.addSql(
      'alter table `audit_events` add index `audit_events_show_id_created_at_index`(`show_id`, `created_at`);',
    );
    this.addSql(
      "create table `email_messages` (`id` varchar(36) not null, `to_address` varchar(254) not null, `subject` varchar(255) not null, `kind` varchar(40) not null, `status` enum('queued', 'sent', 'failed') not null default 'queued', `attempts` int not null default 0, `error` text null, `created_at` datetime not null, `sent_at` datetime null, primary key (`id`)) default character set utf8mb4 engine = InnoDB;",
    );
    this.addSql(
      'alter table `email_messages` add index `email_messages_status_created_at_index`(`status`, `created_at`);',
    );
    this.addSql(
      'create table `shows` (`id` varchar(36) not null, `code` varchar(16) not null, `name` varchar(120) not null, `created_at` datetime not null, `updated_at` datetime not null, `archived_at` datetime null, primary key (`id`)) default character set utf8mb4 engine = InnoDB;',
    );
    this.addSql('alter table `shows` add unique `shows_code_unique`(`code`);');
    this.addSql(
      'create table `sessions` (`id` varchar(36) not null, `token_hash` varchar(64) not null, `user_id` varchar(36) not null, `created_at` datetime not null, `last_seen_at` datetime not null, `idle_expires_at` datetime not null, `absolute_expires_at` datetime not null, `revoked_at` datetime null, `ip` varchar(64) null, `user_agent` varchar(255) null, primary key (`id`)) default character set utf8mb4 engine = InnoDB;',
    );
    this.addSql('alter table `sessions` add unique `sessions_token_hash_unique`(`token_hash`);');
    this.addSql('alter table `sessions` add index `sessions_user_id_index`(`user_id`);');
    this.addSql(
      'alter table `sessions` add index `sessions_user_id_revoked_at_index`(`user_id`, `revoked_at`);',
    );
    this.addSql(
      'create table `pipeline_tokens` (`id` varchar(36) not null, `show_id` varchar(36) not null, `name` varchar(80) not null, `scopes` json not null, `token_hash` varchar(64) not null, `hint` varchar(16) not null, `created_by_id` varchar(36) not null, `created_at` datetime not null, `last_used_at` datetime null, `revoked_at` datetime null, primary key (`id`)) default character set utf8mb4 engine = InnoDB;',
    );
    this.addSql(
      'alter table `pipeline_tokens` add index `pipeline_tokens_show_id_index`(`show_id`);',
    );
    this.addSql(
      'alter table `pipeline_tokens` add unique `pipeline_tokens_token_hash_unique`(`token_hash`);',
    );
    this.addSql(
      'alter table `pipeline_tokens` add index `pipeline_tokens_created_by_id_index`(`created_by_id`);',
    );
    this.addSql(
      'create table `password_resets` (`id` varchar(36) not null, `token_hash` varchar(64) not null, `user_id` varchar(36) not null, `created_at` datetime not null, `expires_at` datetime not null, `used_at` datetime null, primary key (`id`)) default character set utf8mb4 engine = InnoDB;',
    );
    this.addSql(
      'alter table `password_resets` add unique `password_resets_token_hash_unique`(`token_hash`);',
    );
    this.addSql(
      'alter table `password_resets` add index `password_resets_user_id_index`(`user_id`);',
    );
    this.addSql(
      'create table `memberships` (`id` varchar(36) not null, `show_id` varchar(36) not null, `user_id` varchar(36) not null, `created_at` datetime not null, primary key (`id`)) default character set utf8mb4 engine = InnoDB;',
    );
    this.addSql('alter table `memberships` add index `memberships_show_id_index`(`show_id`);');
    this.addSql('alter table `memberships` add index `memberships_user_id_index`(`user_id`);');
    this.addSql(
      'alter table `memberships` add unique `memberships_show_id_user_id_unique`(`show_id`, `user_id`);',
    );
    this.addSql(
      "create table `invitations` (`id` varchar(36) not null, `email` varchar(254) not null, `role` enum('admin', 'technical_artist', 'animator', 'supervisor', 'producer') not null, `show_ids` json not null, `token_hash` varchar(64) not null, `invited_by_id` varchar(36) not null, `created_at` datetime not null, `expires_at` datetime not null, `accepted_at` datetime null, `revoked_at` datetime null, primary key (`id`)) default character set utf8mb4 engine = InnoDB;",
    );
    this.addSql(
      'alter table `invitations` add unique `invitations_token_hash_unique`(`token_hash`);',
    );
    this.addSql(
      'alter table `invitations` add index `invitations_invited_by_id_index`(`invited_by_id`);',
    );
    this.addSql('alter table `invitations` add index `invitations_email_index`(`email`);');
    this.addSql(
      'alter table `sessions` add constraint `sessions_user_id_foreign` foreign key (`user_id`) references `users` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `pipeline_tokens` add constraint `pipeline_tokens_show_id_foreign` foreign key (`show_id`) references `shows` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `pipeline_tokens` add constraint `pipeline_tokens_created_by_id_foreign` foreign key (`created_by_id`) references `users` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `password_resets` add constraint `password_resets_user_id_foreign` foreign key (`user_id`) references `users` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `memberships` add constraint `memberships_show_id_foreign` foreign key (`show_id`) references `shows` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `memberships` add constraint `memberships_user_id_foreign` foreign key (`user_id`) references `users` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `invitations` add constraint `invitations_invited_by_id_foreign` foreign key (`invited_by_id`) references `users` (`id`) on update cascade;',
    );
  }

  override async down(): Promise<void> {
    // Children first: their foreign keys point at shows and users.
    this.addSql('drop table if exists `invitations`;');
    this.addSql('drop table if exists `memberships`;');
    this.addSql('drop table if exists `password_resets`;');
    this.addSql('drop table if exists `pipeline_tokens`;');
    this.addSql('drop table if exists `sessions`;');
    this.addSql('drop table if exists `shows`;');
    this.addSql('drop table if exists `email_messages`;');
    this.addSql('drop table if exists `audit_events`;');
  }
}
