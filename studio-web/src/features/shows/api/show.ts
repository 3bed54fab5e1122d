// A show as GET /api/shows and GET /api/shows/:id return it.

/** One production: everything else belongs to a show. */
export interface Show {
  id: string;
  code: string;
  name: string;
  archived: boolean;
  createdAt: string;
}

/** Checks one show of an answer; `where` names it in the error. */
export function parseShow(value: unknown, where = 'The show answer'): Show {
  const body = (value ?? {}) as Record<string, unknown>;
  for (const name of ['id', 'code', 'name', 'createdAt']) {
    if (typeof body[name] !== 'string') throw new TypeError(`${where} has no "${name}".`);
  }
  return {
    id: body.id as string,
    code: body.code as string,
    name: body.name as string,
    archived: body.archived === true,
    createdAt: body.createdAt as string,
  };
}

/** Checks a list of shows. */
export function parseShows(value: unknown): Show[] {
  if (!Array.isArray(value)) throw new TypeError('The shows answer is not a list.');
  return value.map((item, i) => parseShow(item, `Show ${i + 1} of the answer`));
}
