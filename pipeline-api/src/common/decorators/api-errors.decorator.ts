import { ApiProperty, ApiPropertyOptional, ApiResponse } from '@nestjs/swagger';
import { METHOD_METADATA } from '@nestjs/common/constants';
import { ERROR_CODES, type ErrorCode } from '../errors/error-codes';

const CODES_KEY = 'overshoot:errorCodes';
/** Where @nestjs/swagger keeps a handler's responses (its `SWAGGER_RESPONSES`, not exported). */
const SWAGGER_RESPONSES = 'swagger/apiResponse';

/** The error body every route returns, for the OpenAPI document. */
export class ApiErrorDto {
  @ApiProperty({ example: 'VALIDATION_FAILED' }) code: string;
  @ApiProperty() message: string;
  @ApiPropertyOptional({ description: 'Where the problem is, when the code has such details.' })
  details?: unknown;
}

// Several decorators add codes to one route (access rules and the route's own): keep them all
// on the handler and re-emit one response per status each time. Swagger appends a repeated
// status's description to the one before, so the earlier entry is dropped first.
function addCodes(handler: object, codes: ErrorCode[]): void {
  const all = new Set<ErrorCode>([...(Reflect.getMetadata(CODES_KEY, handler) ?? []), ...codes]);
  Reflect.defineMetadata(CODES_KEY, [...all], handler);
  const byStatus = new Map<number, ErrorCode[]>();
  for (const c of all)
    byStatus.set(ERROR_CODES[c].status, [...(byStatus.get(ERROR_CODES[c].status) ?? []), c]);
  const responses = { ...(Reflect.getMetadata(SWAGGER_RESPONSES, handler) ?? {}) };
  for (const status of byStatus.keys()) delete responses[status];
  Reflect.defineMetadata(SWAGGER_RESPONSES, responses, handler);
  for (const [status, list] of byStatus) {
    const description = list.map((c) => `\`${c}\`: ${ERROR_CODES[c].description}`).join(' ');
    const descriptor = { value: handler } as PropertyDescriptor;
    ApiResponse({ status, description, type: ApiErrorDto })({}, '', descriptor);
  }
}

/** Documents the error codes a route (or every route of a controller) can answer with. */
export function ApiErrors(...codes: ErrorCode[]): MethodDecorator & ClassDecorator {
  return ((
    target: object | (new (...a: unknown[]) => unknown),
    _key?: string | symbol,
    descriptor?: PropertyDescriptor,
  ) => {
    if (descriptor) {
      addCodes(descriptor.value as object, codes);
      return descriptor;
    }
    const proto = (target as { prototype: Record<string, unknown> }).prototype;
    for (const name of Object.getOwnPropertyNames(proto)) {
      const fn = proto[name];
      if (
        name !== 'constructor' &&
        typeof fn === 'function' &&
        Reflect.hasMetadata(METHOD_METADATA, fn)
      )
        addCodes(fn, codes);
    }
    return target;
  }) as MethodDecorator & ClassDecorator;
}

/** The codes documented on a route handler (for tests). */
export const documentedCodes = (handler: object): ErrorCode[] =>
  Reflect.getMetadata(CODES_KEY, handler) ?? [];
