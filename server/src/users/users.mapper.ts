import type { AdminUserRow, Me } from '@broodsilk/shared';
import type { User } from './user.entity';
import { secondFactorRequired } from '../auth/second-factor/second-factor-rule';

export function toMe(user: User): Me {
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    role: user.role,
    timeZone: user.timeZone,
    temperatureUnit: user.temperatureUnit,
    secondFactorEnabled: !!user.totpEnabledAt,
    secondFactorRequired: secondFactorRequired(user.role),
    language: user.language,
    stageNumbering: user.stageNumbering,
  };
}

export function toAdminUserRow(user: User): AdminUserRow {
  return { id: user.id, email: user.email, displayName: user.displayName, role: user.role, createdAt: user.createdAt.toISOString() };
}
