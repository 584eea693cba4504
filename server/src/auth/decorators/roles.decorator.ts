import { SetMetadata } from '@nestjs/common';
import type { Role } from '@keenroute/shared';

export const ROLES_KEY = 'keenroute:roles';

/** The roles that may call a route. A route with neither this nor @Public() is refused to everyone. */
export const Roles = (...roles: [Role, ...Role[]]) => SetMetadata(ROLES_KEY, roles);
