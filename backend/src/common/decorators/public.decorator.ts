import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC = 'isPublic';
/** Opt an operation out of the global JWT guard (sign-in, health, password reset). */
export const Public = () => SetMetadata(IS_PUBLIC, true);
