import { SetMetadata } from '@nestjs/common';
import type { AccountRole } from '@broodsilk/shared';

export const ACCOUNT_ROLES_KEY = 'accountRoles';
/** Restricts a route to the given account roles (global roles; project roles have their own guard). */
export const Roles = (...roles: AccountRole[]) => SetMetadata(ACCOUNT_ROLES_KEY, roles);
