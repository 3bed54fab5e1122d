import { once } from 'node:events';
import type { Writable } from 'node:stream';
import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/mariadb';
import { todayUtc } from '../assets/upload-rules';
import { RenderState } from './render-state';
import { JobState } from '../jobs/job-state';
import { ReviewState } from '../takes/review-state';
import { shotRange, shotRows } from './shot-rows';
import type { ShotView } from './shot-view';
import { isoWeek, weekStart } from './iso-week';
import { csvLine } from './csv';
import type { ShotFilterQuery } from './dto/list-shots.query';

/** Shot counts per state (`none`: no job or take yet), and what is late. */
export interface ShotSummary {
  total: number;
  render: Record<RenderState, number>;
  solve: Record<JobState | 'none', number>;
  review: Record<ReviewState | 'none', number>;
  late: { count: number; shots: { id: string; code: string; dueDate: string; daysLate: number }[] };
}

/** Takes approved in one ISO week. */
export interface WeekThroughput {
  week: string;
  start: string;
  approved: number;
}

/** Rows fetched per query while streaming the CSV export. */
const EXPORT_BATCH = 500;

/** The CSV columns, in order. */
export const CSV_HEADER = [
  'sequence',
  'code',
  'frame_start',
  'frame_end',
  'fps',
  'character_id',
  'clip_id',
  'assignees',
  'due_date',
  'late',
  'solve_state',
  'review_state',
  'render_state',
  'latest_take',
  'updated_at',
];

const csvRow = (s: ShotView): unknown[] => [
  s.sequence,
  s.code,
  s.frameStart,
  s.frameEnd,
  s.fps,
  s.characterId ?? '',
  s.clipId ?? '',
  s.assignees.map((a) => a.displayName).join('; '),
  s.dueDate ?? '',
  s.late ? 'yes' : 'no',
  s.solveState ?? '',
  s.reviewState ?? '',
  s.renderState,
  s.latestTakeVersion ? `v${s.latestTakeVersion}` : '',
  s.updatedAt,
];

const zeros = <K extends string>(keys: readonly K[]) =>
  Object.fromEntries(keys.map((k) => [k, 0])) as Record<K, number>;

/** The producer's view: counts by state, lateness, throughput, and the CSV export. */
@Injectable()
export class TrackingService {
  constructor(private readonly em: EntityManager) {}

  /** Counts of the show's shots by render, solve and review state, and the late shots. */
  async summary(showId: string): Promise<ShotSummary> {
    const today = todayUtc();
    const rows: {
      render_state: RenderState;
      solve_state: JobState | null;
      review_state: ReviewState | null;
      n: number;
    }[] = await this.em.execute(
      'select render_state, solve_state, review_state, count(*) as n from shots where show_id = ? group by render_state, solve_state, review_state',
      [showId],
    );
    const summary: ShotSummary = {
      total: 0,
      render: zeros(Object.values(RenderState)),
      solve: zeros([...Object.values(JobState), 'none' as const]),
      review: zeros([...Object.values(ReviewState), 'none' as const]),
      late: { count: 0, shots: [] },
    };
    for (const r of rows) {
      const n = Number(r.n);
      summary.total += n;
      summary.render[r.render_state] += n;
      summary.solve[r.solve_state ?? 'none'] += n;
      summary.review[r.review_state ?? 'none'] += n;
    }
    const late = { late: true, sort: 'dueDate:asc,code:asc' };
    // The count comes from the page itself when fewer than 100 shots are late.
    const { items: lateShots, total } = await shotRange(this.em, showId, late, today, {
      limit: 100,
      offset: 0,
    });
    summary.late.count = total;
    summary.late.shots = lateShots.map((s) => ({
      id: s.id,
      code: s.code,
      dueDate: s.dueDate as string,
      daysLate: Math.round((Date.parse(today) - Date.parse(s.dueDate as string)) / 86_400_000),
    }));
    return summary;
  }

  /** Takes approved per ISO week over the last `weeks` weeks (this week last), zeros included. */
  async throughput(showId: string, weeks: number, now = new Date()): Promise<WeekThroughput[]> {
    const first = weekStart(now);
    first.setUTCDate(first.getUTCDate() - 7 * (weeks - 1));
    const rows: { at: Date }[] = await this.em.execute(
      "select d.at from review_decisions d join takes t on t.id = d.take_id where t.show_id = ? and d.decision = 'approved' and d.at >= ?",
      [showId, first],
    );
    const counts = new Map<string, number>();
    for (const r of rows)
      counts.set(isoWeek(new Date(r.at)), (counts.get(isoWeek(new Date(r.at))) ?? 0) + 1);
    return Array.from({ length: weeks }, (_, i) => {
      const start = new Date(first.getTime() + i * 7 * 86_400_000);
      const week = isoWeek(start);
      return { week, start: start.toISOString().slice(0, 10), approved: counts.get(week) ?? 0 };
    });
  }

  /** Streams the shots matching the filters as CSV: a header row, then one row per shot. */
  async exportCsv(showId: string, filter: ShotFilterQuery, out: Writable): Promise<void> {
    const today = todayUtc();
    const write = async (line: string) => {
      if (!out.write(line)) await once(out, 'drain');
    };
    await write(csvLine(CSV_HEADER));
    for (let offset = 0; ; offset += EXPORT_BATCH) {
      const batch = await shotRows(this.em, showId, filter, today, { limit: EXPORT_BATCH, offset });
      for (const shot of batch) await write(csvLine(csvRow(shot)));
      if (batch.length < EXPORT_BATCH) break;
    }
  }
}
