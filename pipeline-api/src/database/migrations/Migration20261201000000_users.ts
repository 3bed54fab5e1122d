import { Migration } from '@mikro-orm/migrations';

/** First migration: the users table. */
export class Migration20261201000000_users extends Migration {
  override async up(): Promise<void> {
    this.addSql(`create table \`users\` (
      \`id\` varchar(36) not null,
      \`email\` varchar(254) not null,
      \`display_name\` varchar(120) not null,
      \`password_hash\` varchar(255) not null,
      \`role\` enum('admin', 'technical_artist', 'animator', 'supervisor', 'producer') not null,
      \`created_at\` datetime not null,
      \`updated_at\` datetime not null,
      \`disabled_at\` datetime null,
      primary key (\`id\`)
    ) default character set utf8mb4 engine = InnoDB;`);
    this.addSql('alter table `users` add unique `users_email_unique`(`email`);');
  }

  override async down(): Promise<void> {
    this.addSql('drop table if exists `users`;');
  }
}
