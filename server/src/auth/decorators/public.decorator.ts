import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC_KEY = 'keenroute:public';

/** Marks one of the few routes open without sign-in. Every other route must name its roles. */
export const Public = () => SetMetadata(IS_PUBLIC_KEY, true);
