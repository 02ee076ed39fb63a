import { SetMetadata } from '@nestjs/common';

export const TOKEN_ACCESS = 'ligament:token-access';
/** A personal API token may call this route (upload and read of the token's project only). */
export const TokenAccess = () => SetMetadata(TOKEN_ACCESS, true);
