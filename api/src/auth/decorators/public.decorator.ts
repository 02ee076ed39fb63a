import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC = 'ligament:public';
/** The route needs no sign-in. */
export const Public = () => SetMetadata(IS_PUBLIC, true);
