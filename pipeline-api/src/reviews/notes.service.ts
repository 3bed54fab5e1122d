import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/mariadb';
import { DomainError } from '../common/errors/domain-error';
import type { UserPrincipal } from '../auth/principal';
import { Role } from '../users/entities/role';
import { TakesService } from '../takes/takes.service';
import type { Take } from '../takes/entities/take.entity';
import { Note } from './entities/note.entity';
import { validateMark } from './note-mark';
import { noteView, type NoteView } from './review-views';
import type { CreateNoteDto, UpdateNoteDto } from './dto/review.dto';

const noteNotFound = (id: string) =>
  new DomainError('not_found', 'NOTE_NOT_FOUND', `No note ${id} in this show.`, { noteId: id });

/** Throws NOTE_FRAME_OUT_OF_RANGE unless the frame is inside the take's shot range. */
function assertFrame(take: Take, frame: number): void {
  if (take.shot.hasFrame(frame)) return;
  throw new DomainError(
    'invalid',
    'NOTE_FRAME_OUT_OF_RANGE',
    `Frame ${frame} is outside the shot's range ${take.shot.frameStart}–${take.shot.frameEnd}.`,
    { frame, frameStart: take.shot.frameStart, frameEnd: take.shot.frameEnd },
  );
}

/** Review notes pinned to a take and a frame: write, edit (author), resolve and reopen. */
@Injectable()
export class NotesService {
  constructor(
    private readonly em: EntityManager,
    private readonly takes: TakesService,
  ) {}

  /** The take's notes by frame. */
  async list(showId: string, takeId: string): Promise<NoteView[]> {
    const take = await this.takes.find(showId, takeId);
    const notes = await this.em.find(
      Note,
      { take },
      { populate: ['author'], orderBy: { frame: 'asc', createdAt: 'asc' } },
    );
    return notes.map(noteView);
  }

  /** Pins a note to a frame of the take. */
  async create(
    actor: UserPrincipal,
    showId: string,
    takeId: string,
    body: CreateNoteDto,
  ): Promise<NoteView> {
    const take = await this.takes.find(showId, takeId);
    assertFrame(take, body.frame);
    const note = new Note(take, body.frame, body.text, validateMark(body.mark), actor.user);
    await this.em.persistAndFlush(note);
    return noteView(note);
  }

  /** Edits a note's frame, text or mark; only its author (or an admin) may. */
  async update(
    actor: UserPrincipal,
    showId: string,
    noteId: string,
    body: UpdateNoteDto,
  ): Promise<NoteView> {
    const note = await this.find(showId, noteId);
    if (note.author.id !== actor.user.id && actor.user.role !== Role.Admin) {
      throw new DomainError(
        'forbidden',
        'NOTE_NOT_AUTHOR',
        'Only the author of a note may edit it.',
        {
          noteId,
        },
      );
    }
    if (body.frame !== undefined) {
      assertFrame(note.take, body.frame);
      note.frame = body.frame;
    }
    if (body.mark !== undefined) note.mark = validateMark(body.mark);
    if (body.text !== undefined) note.text = body.text;
    await this.em.flush();
    return noteView(note);
  }

  /** Marks a note resolved (or open again). */
  async setResolved(
    actor: UserPrincipal,
    showId: string,
    noteId: string,
    resolved: boolean,
  ): Promise<NoteView> {
    const note = await this.find(showId, noteId);
    if (note.resolved !== resolved) {
      note.resolved = resolved;
      note.resolvedBy = resolved ? actor.user : null;
      note.resolvedAt = resolved ? new Date() : null;
      await this.em.flush();
    }
    return noteView(note);
  }

  private async find(showId: string, noteId: string): Promise<Note> {
    const note = await this.em.findOne(
      Note,
      { id: noteId, take: { show: showId } },
      { populate: ['author', 'take.shot', 'resolvedBy'] },
    );
    if (!note) throw noteNotFound(noteId);
    return note;
  }
}
