import { json, type NextFunction, type Request, type Response } from 'express';
import type { ApiErrorBody } from '../filters/api-exception.filter';

/** Largest JSON body any route accepts; files go straight to the S3 store, never through here. */
export const JSON_BODY_LIMIT = '1mb';

/** The JSON body parser and, right behind it, the answer to a body it cannot read. */
export function jsonBody() {
  const parse = json({ limit: JSON_BODY_LIMIT });
  const onError = (
    err: { type?: string; message?: string },
    _req: Request,
    res: Response,
    next: NextFunction,
  ) => {
    const answer = (status: number, body: ApiErrorBody) => res.status(status).json(body);
    if (err?.type === 'entity.parse.failed') {
      return answer(400, {
        code: 'MALFORMED_JSON',
        message: `The request body is not valid JSON: ${err.message}`,
      });
    }
    if (err?.type === 'entity.too.large') {
      return answer(413, {
        code: 'PAYLOAD_TOO_LARGE',
        message: `The request body is larger than ${JSON_BODY_LIMIT}.`,
      });
    }
    if (err?.type === 'encoding.unsupported' || err?.type === 'charset.unsupported') {
      return answer(415, {
        code: 'UNSUPPORTED_ENCODING',
        message: err.message ?? 'Unsupported body encoding.',
      });
    }
    return next(err);
  };
  return [parse, onError] as const;
}
