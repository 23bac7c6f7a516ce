import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC = 'tressury:public';

/** Opens a route to callers without a token (sign-in, refresh, health). */
export const Public = () => SetMetadata(IS_PUBLIC, true);
