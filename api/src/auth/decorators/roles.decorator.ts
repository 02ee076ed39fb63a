import { SetMetadata } from '@nestjs/common';
import type { Role } from '../role.enum.js';

export const ROLES_KEY = 'ligament:roles';
/** Only these roles may call the route (no decorator: any signed-in role). */
export const Roles = (...roles: Role[]) => SetMetadata(ROLES_KEY, roles);
