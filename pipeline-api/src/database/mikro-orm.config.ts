import { defineConfig } from '@mikro-orm/mariadb';
import { Migrator } from '@mikro-orm/migrations';
import type { Env } from '../config/env.validation';
import { User } from '../users/entities/user.entity';
import { Invitation } from '../users/entities/invitation.entity';
import { Session } from '../auth/entities/session.entity';
import { PasswordReset } from '../auth/entities/password-reset.entity';
import { Show } from '../shows/entities/show.entity';
import { Membership } from '../shows/entities/membership.entity';
import { PipelineToken } from '../tokens/entities/pipeline-token.entity';
import { EmailMessage } from '../mail/entities/email-message.entity';
import { AuditEvent } from '../audit/entities/audit-event.entity';
import { Asset } from '../assets/entities/asset.entity';
import { Character } from '../library/entities/character.entity';
import { Capture } from '../library/entities/capture.entity';
import { Clip } from '../library/entities/clip.entity';
import { TissueProfile } from '../library/entities/tissue-profile.entity';
import { Shot } from '../shots/entities/shot.entity';
import { RetargetJob } from '../jobs/entities/retarget-job.entity';
import { LearnJob } from '../jobs/entities/learn-job.entity';
import { Take } from '../takes/entities/take.entity';
import { Note } from '../reviews/entities/note.entity';
import { ReviewDecision } from '../reviews/entities/review-decision.entity';
import { MIGRATIONS } from './migrations';

/** Every entity the ORM knows. */
export const ENTITIES = [
  User,
  Invitation,
  Session,
  PasswordReset,
  Show,
  Membership,
  PipelineToken,
  EmailMessage,
  AuditEvent,
  Asset,
  Character,
  Capture,
  Clip,
  TissueProfile,
  Shot,
  RetargetJob,
  LearnJob,
  Take,
  Note,
  ReviewDecision,
];

/** MikroORM options from the validated environment. */
export function ormConfig(env: Env) {
  return defineConfig({
    host: env.DB_HOST,
    port: env.DB_PORT,
    dbName: env.DB_NAME,
    user: env.DB_USER,
    password: env.DB_PASSWORD,
    entities: ENTITIES,
    extensions: [Migrator],
    // MariaDB commits DDL implicitly, so wrapping migrations in transactions only adds a warning.
    migrations: { migrationsList: MIGRATIONS, transactional: false, silent: true },
    // Fail fast when MariaDB is down instead of queueing requests for a minute.
    pool: { min: 0, max: 10, acquireTimeoutMillis: 3000 },
    driverOptions: { connectTimeout: 3000 },
    debug: false,
    allowGlobalContext: false,
  });
}
