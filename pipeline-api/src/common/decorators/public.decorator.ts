import { applyDecorators, SetMetadata } from '@nestjs/common';
import { ApiExtension } from '@nestjs/swagger';

export const IS_PUBLIC = 'overshoot:isPublic';

/** Marks a route that needs no sign-in; every other route is denied by the access guard. */
export const Public = () =>
  applyDecorators(SetMetadata(IS_PUBLIC, true), ApiExtension('x-access', { public: true }));
