// A show's pipeline token as the admin API shows it; the secret appears only when created.

/** What a token may do in its show. */
export const TOKEN_SCOPES = ['jobs:submit', 'takes:read', 'render:write'] as const;
/** One token scope. */
export type TokenScope = (typeof TOKEN_SCOPES)[number];

/** Each scope in words. */
export const TOKEN_SCOPE_WORDS: Record<TokenScope, string> = {
  'jobs:submit': 'Submit retarget jobs',
  'takes:read': 'Read takes',
  'render:write': 'Report render state',
};

/** A token without its secret. */
export interface PipelineToken {
  id: string;
  showId: string;
  name: string;
  scopes: TokenScope[];
  /** The first characters of the secret, to tell tokens apart. */
  hint: string;
  createdAt: string;
  createdBy: string;
  lastUsedAt: string | null;
  revokedAt: string | null;
}

/** A token just created, with the secret shown this once. */
export interface CreatedToken extends PipelineToken {
  secret: string;
}

const isScope = (v: unknown): v is TokenScope =>
  typeof v === 'string' && (TOKEN_SCOPES as readonly string[]).includes(v);

/** Checks one token of an answer. */
export function parseToken(value: unknown, where = 'The token'): PipelineToken {
  const b = (value ?? {}) as Record<string, unknown>;
  for (const name of ['id', 'showId', 'name', 'createdAt']) {
    if (typeof b[name] !== 'string') throw new TypeError(`${where} has no "${name}".`);
  }
  const scopes = Array.isArray(b.scopes) ? b.scopes.filter(isScope) : [];
  return {
    id: b.id as string,
    showId: b.showId as string,
    name: b.name as string,
    scopes,
    hint: typeof b.hint === 'string' ? b.hint : '',
    createdAt: b.createdAt as string,
    createdBy: typeof b.createdBy === 'string' ? b.createdBy : '',
    lastUsedAt: typeof b.lastUsedAt === 'string' ? b.lastUsedAt : null,
    revokedAt: typeof b.revokedAt === 'string' ? b.revokedAt : null,
  };
}

/** Checks a create answer: a token plus its secret. */
export function parseCreatedToken(value: unknown): CreatedToken {
  const secret = (value as { secret?: unknown } | null)?.secret;
  if (typeof secret !== 'string' || secret === '') {
    throw new TypeError('The new token answer has no secret.');
  }
  return { ...parseToken(value, 'The new token'), secret };
}

/** Checks a list of tokens. */
export function parseTokens(value: unknown): PipelineToken[] {
  if (!Array.isArray(value)) throw new TypeError('The tokens answer is not a list.');
  return value.map((t, i) => parseToken(t, `Token ${i + 1} of the answer`));
}
