// Answers of the API in the shapes it documents, for component tests.

/** A show. */
export const SHOW = {
  id: 'show-1',
  code: 'HARBOR',
  name: 'Harbor Lights',
  archived: false,
  createdAt: '2030-01-01T00:00:00.000Z',
};

/** A shot row of GET /shows/:id/shots. */
export function shotBody(code: string, extra: Record<string, unknown> = {}) {
  return {
    id: `shot-${code}`,
    sequence: 'SQ010',
    code,
    frameStart: 1001,
    frameEnd: 1096,
    fps: 24,
    characterId: null,
    clipId: null,
    assignees: [],
    dueDate: null,
    late: false,
    renderState: 'not_started',
    solveState: null,
    reviewState: null,
    latestTakeVersion: null,
    createdAt: '2030-01-02T00:00:00.000Z',
    updatedAt: '2030-01-02T00:00:00.000Z',
    ...extra,
  };
}

/** A page of shots. */
export function shotPageBody(items: unknown[], total = items.length, page = 1) {
  return { items, total, page, pageSize: 25 };
}

/** GET /shows/:id/shots/summary with everything at zero but what is given. */
export function summaryBody(extra: Record<string, unknown> = {}) {
  return {
    total: 0,
    render: { not_started: 0, queued: 0, rendering: 0, rendered: 0, failed: 0 },
    solve: { queued: 0, solving: 0, solved: 0, failed: 0, canceled: 0, none: 0 },
    review: { awaiting_review: 0, approved: 0, changes_requested: 0, none: 0 },
    late: { count: 0, shots: [] },
    ...extra,
  };
}

/** GET /shows/:id/shots/throughput with `counts` per week, oldest first. */
export function throughputBody(counts: number[]) {
  return counts.map((approved, i) => ({
    week: `2030-W${String(i + 1).padStart(2, '0')}`,
    start: `2030-01-${String(1 + i).padStart(2, '0')}`,
    approved,
  }));
}
