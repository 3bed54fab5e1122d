import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC = 'overshoot:isPublic';

/** Marks a route that needs no sign-in; every other route is denied by the access guard. */
export const Public = () => SetMetadata(IS_PUBLIC, true);
