import { Migration } from '@mikro-orm/migrations';

/** The library: uploaded assets, characters, captures with consent records, clips, tissue profiles. */
export class Migration20261203000000_library extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      "create table `assets` (`id` varchar(36) not null, `show_id` varchar(36) not null, `kind` enum('character', 'capture', 'clip') not null, `s3_key` varchar(255) not null, `size` bigint not null, `sha256` varchar(64) not null, `content_type` varchar(100) not null, `original_name` varchar(255) not null, `state` enum('pending', 'ready', 'rejected') not null, `validation_report` json null, `progress` json null, `upload_id` varchar(255) null, `uploaded_by_id` varchar(36) not null, `created_at` datetime not null, `updated_at` datetime not null, `uploaded_at` datetime null, `checked_at` datetime null, primary key (`id`)) default character set utf8mb4 engine = InnoDB;",
    );
    this.addSql('alter table `assets` add index `assets_show_id_index`(`show_id`);');
    this.addSql('alter table `assets` add index `assets_uploaded_by_id_index`(`uploaded_by_id`);');
    this.addSql(
      'alter table `assets` add index `assets_show_id_kind_state_index`(`show_id`, `kind`, `state`);',
    );
    this.addSql(
      "create table `clips` (`id` varchar(36) not null, `show_id` varchar(36) not null, `asset_id` varchar(36) not null, `name` varchar(120) not null, `format` enum('bvh', 'glb') not null, `fps` double null, `frame_count` int null, `joints` json null, `created_at` datetime not null, primary key (`id`)) default character set utf8mb4 engine = InnoDB;",
    );
    this.addSql('alter table `clips` add index `clips_show_id_index`(`show_id`);');
    this.addSql('alter table `clips` add unique `clips_asset_id_unique`(`asset_id`);');
    this.addSql(
      'create table `characters` (`id` varchar(36) not null, `show_id` varchar(36) not null, `asset_id` varchar(36) not null, `name` varchar(120) not null, `version` int null, `vertex_count` int null, `triangle_count` int null, `joints` json null, `regions` json null, `bbox` json null, `created_at` datetime not null, primary key (`id`)) default character set utf8mb4 engine = InnoDB;',
    );
    this.addSql('alter table `characters` add index `characters_show_id_index`(`show_id`);');
    this.addSql('alter table `characters` add unique `characters_asset_id_unique`(`asset_id`);');
    this.addSql(
      'alter table `characters` add unique `characters_show_id_name_version_unique`(`show_id`, `name`, `version`);',
    );
    this.addSql(
      'create table `captures` (`id` varchar(36) not null, `show_id` varchar(36) not null, `asset_id` varchar(36) not null, `character_id` varchar(36) not null, `frame_count` int null, `fps` double null, `performer_code` varchar(40) not null, `consent_scope` varchar(500) not null, `consent_expires_on` date not null, `consent_recorded_by_id` varchar(36) not null, `consent_recorded_at` datetime not null, `deleted_at` datetime null, `deletion_reason` varchar(500) null, `deleted_by_id` varchar(36) null, primary key (`id`)) default character set utf8mb4 engine = InnoDB;',
    );
    this.addSql('alter table `captures` add index `captures_show_id_index`(`show_id`);');
    this.addSql('alter table `captures` add unique `captures_asset_id_unique`(`asset_id`);');
    this.addSql('alter table `captures` add index `captures_character_id_index`(`character_id`);');
    this.addSql(
      'alter table `captures` add index `captures_consent_recorded_by_id_index`(`consent_recorded_by_id`);',
    );
    this.addSql(
      'alter table `captures` add index `captures_deleted_by_id_index`(`deleted_by_id`);',
    );
    this.addSql(
      "create table `tissue_profiles` (`id` varchar(36) not null, `show_id` varchar(36) not null, `capture_id` varchar(36) not null, `character_id` varchar(36) not null, `name` varchar(120) not null, `state` enum('queued', 'learning', 'ready', 'failed') not null, `modes` json null, `fit_report` json null, `files` json null, `capture_deleted_at` datetime null, `created_at` datetime not null, `updated_at` datetime not null, primary key (`id`)) default character set utf8mb4 engine = InnoDB;",
    );
    this.addSql(
      'alter table `tissue_profiles` add index `tissue_profiles_show_id_index`(`show_id`);',
    );
    this.addSql(
      'alter table `tissue_profiles` add index `tissue_profiles_capture_id_index`(`capture_id`);',
    );
    this.addSql(
      'alter table `tissue_profiles` add index `tissue_profiles_character_id_index`(`character_id`);',
    );
    this.addSql(
      'alter table `tissue_profiles` add index `tissue_profiles_show_id_state_index`(`show_id`, `state`);',
    );
    this.addSql(
      'alter table `assets` add constraint `assets_show_id_foreign` foreign key (`show_id`) references `shows` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `assets` add constraint `assets_uploaded_by_id_foreign` foreign key (`uploaded_by_id`) references `users` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `clips` add constraint `clips_show_id_foreign` foreign key (`show_id`) references `shows` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `clips` add constraint `clips_asset_id_foreign` foreign key (`asset_id`) references `assets` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `characters` add constraint `characters_show_id_foreign` foreign key (`show_id`) references `shows` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `characters` add constraint `characters_asset_id_foreign` foreign key (`asset_id`) references `assets` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `captures` add constraint `captures_show_id_foreign` foreign key (`show_id`) references `shows` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `captures` add constraint `captures_asset_id_foreign` foreign key (`asset_id`) references `assets` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `captures` add constraint `captures_character_id_foreign` foreign key (`character_id`) references `characters` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `captures` add constraint `captures_consent_recorded_by_id_foreign` foreign key (`consent_recorded_by_id`) references `users` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `captures` add constraint `captures_deleted_by_id_foreign` foreign key (`deleted_by_id`) references `users` (`id`) on update cascade on delete set null;',
    );
    this.addSql(
      'alter table `tissue_profiles` add constraint `tissue_profiles_show_id_foreign` foreign key (`show_id`) references `shows` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `tissue_profiles` add constraint `tissue_profiles_capture_id_foreign` foreign key (`capture_id`) references `captures` (`id`) on update cascade;',
    );
    this.addSql(
      'alter table `tissue_profiles` add constraint `tissue_profiles_character_id_foreign` foreign key (`character_id`) references `characters` (`id`) on update cascade;',
    );
  }

  override async down(): Promise<void> {
    // Children first: their foreign keys point at the tables after them.
    this.addSql('drop table if exists `tissue_profiles`;');
    this.addSql('drop table if exists `captures`;');
    this.addSql('drop table if exists `clips`;');
    this.addSql('drop table if exists `characters`;');
    this.addSql('drop table if exists `assets`;');
  }
}
