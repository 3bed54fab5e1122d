import { Migration } from '@mikro-orm/migrations';

/**
 * The shot list's default order (sequence, code) and the tracking order (due date, code) read
 * from an index instead of sorting every shot of the show for each page.
 */
export class Migration20261205000000_shot_list_indexes extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      'alter table `shots` add index `shots_show_id_sequence_code_index`(`show_id`, `sequence`, `code`);',
    );
    this.addSql(
      'alter table `shots` add index `shots_show_id_due_date_code_index`(`show_id`, `due_date`, `code`);',
    );
    this.addSql('alter table `shots` drop index `shots_show_id_sequence_index`;');
    this.addSql('alter table `shots` drop index `shots_show_id_due_date_index`;');
  }

  override async down(): Promise<void> {
    this.addSql(
      'alter table `shots` add index `shots_show_id_sequence_index`(`show_id`, `sequence`);',
    );
    this.addSql(
      'alter table `shots` add index `shots_show_id_due_date_index`(`show_id`, `due_date`);',
    );
    this.addSql('alter table `shots` drop index `shots_show_id_sequence_code_index`;');
    this.addSql('alter table `shots` drop index `shots_show_id_due_date_code_index`;');
  }
}
