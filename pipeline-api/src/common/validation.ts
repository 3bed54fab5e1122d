import { ValidationError, ValidationPipe } from '@nestjs/common';
import { DomainError } from './errors/domain-error';

/** Flattens nested validation errors into `{ field, problems }` rows. */
function rows(errors: ValidationError[], parent = ''): { field: string; problems: string[] }[] {
  return errors.flatMap((e) => {
    const field = parent ? `${parent}.${e.property}` : e.property;
    const own = e.constraints ? [{ field, problems: Object.values(e.constraints) }] : [];
    return [...own, ...rows(e.children ?? [], field)];
  });
}

/** The one global pipe: unknown fields rejected, every problem listed by field. */
export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    exceptionFactory: (errors) =>
      new DomainError(
        'invalid',
        'VALIDATION_FAILED',
        'Some fields of the request are not valid.',
        rows(errors),
      ),
  });
}
