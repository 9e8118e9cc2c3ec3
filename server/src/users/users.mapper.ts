import type { AdminUserRow, Me } from '@broodsilk/shared';
import type { User } from './user.entity';

export function toMe(user: User): Me {
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    role: user.role,
    timeZone: user.timeZone,
    temperatureUnit: user.temperatureUnit,
    language: user.language,
    stageNumbering: user.stageNumbering,
  };
}

export function toAdminUserRow(user: User): AdminUserRow {
  return { id: user.id, email: user.email, displayName: user.displayName, role: user.role, createdAt: user.createdAt.toISOString() };
}
