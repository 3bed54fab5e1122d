import { Injectable } from '@nestjs/common';
import { EntityManager, UniqueConstraintViolationException } from '@mikro-orm/mariadb';
import { DomainError } from '../common/errors/domain-error';
import { AuditService } from '../audit/audit.service';
import type { Principal } from '../auth/principal';
import { Role } from '../users/entities/role';
import { User } from '../users/entities/user.entity';
import { Show } from '../shows/entities/show.entity';
import { Membership } from '../shows/entities/membership.entity';
import { AssetState } from '../assets/entities/asset.entity';
import { todayUtc } from '../assets/upload-rules';
import { Character } from '../library/entities/character.entity';
import { Clip } from '../library/entities/clip.entity';
import {
  characterNotFound,
  characterNotReady,
  clipNotFound,
  clipNotReady,
} from '../library/library-errors';
import { Shot } from './entities/shot.entity';
import { assertRenderTransition, type RenderState } from './render-state';
import { shotView, type ShotView } from './shot-view';
import { lastShotFrame } from './shot-frames';
import { shotRange } from './shot-rows';
import type { CreateShotDto, UpdateShotDto } from './dto/shot-fields.dto';
import type { ListShotsQuery } from './dto/list-shots.query';

/** One page of the shot list. */
export interface ShotPage {
  items: ShotView[];
  total: number;
  page: number;
  pageSize: number;
}

/** Fields a producer may change (product.md: set due dates and assignees). */
const PRODUCER_FIELDS = ['dueDate', 'assigneeIds'];

/** Fields that move the shot's frames within its clip: changing one checks the range again. */
const RANGE_FIELDS = ['frameStart', 'frameEnd', 'fps', 'clipId'];

/** No such shot in the show. */
export const shotNotFound = (id: string) =>
  new DomainError('not_found', 'SHOT_NOT_FOUND', `No shot ${id} in this show.`, { shotId: id });

/** Shots: create and edit with field checks, list with filter, sort and paging, render state. */
@Injectable()
export class ShotsService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
  ) {}

  /** One page of the show's shots with the number of matches (plain rows, one query). */
  async list(showId: string, q: ListShotsQuery): Promise<ShotPage> {
    const page = q.page ?? 1;
    const pageSize = q.pageSize ?? 50;
    const range = { limit: pageSize, offset: (page - 1) * pageSize };
    const { items, total } = await shotRange(this.em, showId, q, todayUtc(), range);
    return { items, total, page, pageSize };
  }

  /** One shot of the show. */
  async get(showId: string, id: string): Promise<ShotView> {
    return shotView(await this.find(showId, id), todayUtc());
  }

  /** Creates a shot after checking its code, range, character, clip and assignees. */
  async create(actor: Principal, showId: string, body: CreateShotDto): Promise<ShotView> {
    const shot = new Shot(this.em.getReference(Show, showId), body);
    if (body.characterId) shot.character = await this.readyCharacter(showId, body.characterId);
    if (body.clipId) shot.clip = await this.readyClip(showId, body.clipId);
    if (body.assigneeIds) shot.assignees.set(await this.members(showId, body.assigneeIds));
    shot.dueDate = body.dueDate ?? null;
    checkRange(shot);
    this.em.persist(shot);
    this.audit.add(this.em, actor, {
      action: 'shot.created',
      objectType: 'shot',
      objectId: shot.id,
      showId,
      details: { code: shot.code },
    });
    await this.flushUnique(shot.code);
    return shotView(shot, todayUtc());
  }

  /** Edits a shot; producers may change only the due date and the assignees. */
  async update(
    actor: Principal,
    showId: string,
    id: string,
    body: UpdateShotDto,
  ): Promise<ShotView> {
    const given = Object.keys(body).filter((k) => body[k as keyof UpdateShotDto] !== undefined);
    if (actor.kind === 'user' && actor.user.role === Role.Producer) {
      const other = given.filter((k) => !PRODUCER_FIELDS.includes(k));
      if (other.length > 0) {
        throw new DomainError(
          'forbidden',
          'SHOT_FIELDS_NOT_ALLOWED',
          `Producers may change only ${PRODUCER_FIELDS.join(' and ')}.`,
          { fields: other },
        );
      }
    }
    const shot = await this.find(showId, id);
    if (body.sequence !== undefined) shot.sequence = body.sequence;
    if (body.code !== undefined) shot.code = body.code;
    if (body.frameStart !== undefined) shot.frameStart = body.frameStart;
    if (body.frameEnd !== undefined) shot.frameEnd = body.frameEnd;
    if (body.fps !== undefined) shot.fps = body.fps;
    if (body.characterId !== undefined)
      shot.character = body.characterId
        ? await this.readyCharacter(showId, body.characterId)
        : null;
    if (body.clipId !== undefined)
      shot.clip = body.clipId ? await this.readyClip(showId, body.clipId) : null;
    if (body.assigneeIds !== undefined)
      shot.assignees.set(await this.members(showId, body.assigneeIds));
    if (body.dueDate !== undefined) shot.dueDate = body.dueDate;
    // The range is checked only when it or the clip changes: a stored range passed when it was
    // set, and a due date or an assignee must stay editable whatever the clip holds now.
    if (RANGE_FIELDS.some((k) => given.includes(k))) {
      if (shot.clip) await this.em.populate(shot, ['clip']);
      checkRange(shot);
    }
    this.audit.add(this.em, actor, {
      action: 'shot.updated',
      objectType: 'shot',
      objectId: shot.id,
      showId,
      details: { fields: given },
    });
    await this.flushUnique(shot.code);
    return shotView(shot, todayUtc());
  }

  /** Moves the shot's render state (a pipeline token or a producer); bad moves answer 409. */
  async setRenderState(
    actor: Principal,
    showId: string,
    id: string,
    to: RenderState,
  ): Promise<ShotView> {
    const shot = await this.find(showId, id);
    const from = shot.renderState;
    assertRenderTransition(from, to);
    if (from !== to) {
      shot.renderState = to;
      shot.renderStateAt = new Date();
      this.audit.add(this.em, actor, {
        action: 'shot.render_state',
        objectType: 'shot',
        objectId: shot.id,
        showId,
        details: { from, to },
      });
      await this.em.flush();
    }
    return shotView(shot, todayUtc());
  }

  private async find(showId: string, id: string): Promise<Shot> {
    const shot = await this.em.findOne(Shot, { id, show: showId }, { populate: ['assignees'] });
    if (!shot) throw shotNotFound(id);
    return shot;
  }

  private async flushUnique(code: string): Promise<void> {
    try {
      await this.em.flush();
    } catch (e) {
      if (e instanceof UniqueConstraintViolationException) {
        throw new DomainError(
          'conflict',
          'SHOT_CODE_TAKEN',
          `Another shot of the show is ${code}.`,
          {
            code,
          },
        );
      }
      throw e;
    }
  }

  private async readyCharacter(showId: string, id: string): Promise<Character> {
    const c = await this.em.findOne(Character, { id, show: showId }, { populate: ['asset'] });
    if (!c) throw characterNotFound(id);
    if (c.asset.state !== AssetState.Ready) throw characterNotReady(c);
    return c;
  }

  private async readyClip(showId: string, id: string): Promise<Clip> {
    const c = await this.em.findOne(Clip, { id, show: showId }, { populate: ['asset'] });
    if (!c) throw clipNotFound(id);
    if (c.asset.state !== AssetState.Ready) throw clipNotReady(c);
    return c;
  }

  /** The users, each of whom must be a member of the show. */
  private async members(showId: string, ids: string[]): Promise<User[]> {
    const unique = [...new Set(ids)];
    const found = await this.em.find(
      Membership,
      { show: showId, user: { $in: unique } },
      { populate: ['user'] },
    );
    const missing = unique.filter((id) => !found.some((m) => m.user.id === id));
    if (missing.length > 0) {
      throw new DomainError(
        'invalid',
        'SHOT_ASSIGNEE_INVALID',
        'Every assignee must be a member of the show.',
        { userIds: missing },
      );
    }
    return found.map((m) => m.user);
  }
}

/**
 * The frame range must be non-empty and, with a clip, inside it (`shot-frames.ts` says how a
 * shot's frames sit in its clip). Messages and details speak in shot frames.
 */
function checkRange(shot: Shot): void {
  const bad = (message: string, details: Record<string, unknown>) =>
    new DomainError('invalid', 'SHOT_FRAME_RANGE_INVALID', message, {
      frameStart: shot.frameStart,
      frameEnd: shot.frameEnd,
      ...details,
    });
  if (shot.frameEnd < shot.frameStart) throw bad('frameEnd comes before frameStart.', {});
  const clip = shot.clip;
  if (!clip || !clip.frameCount || !clip.fps) return;
  const lastFrame = lastShotFrame(shot, clip.frameCount, clip.fps);
  if (shot.frameEnd > lastFrame) {
    throw bad(
      `The clip ends at shot frame ${lastFrame} (${clip.frameCount} frames at ${clip.fps} fps, from shot frame ${shot.frameStart}): end the shot at frame ${lastFrame} or earlier, or pick a longer clip.`,
      {
        clipFrames: clip.frameCount,
        clipFps: clip.fps,
        lastFrame,
      },
    );
  }
}
