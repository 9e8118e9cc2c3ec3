import type { Language } from '../i18n/words.js';
import type { StageNumbering } from '../breeding/brood-stage.js';
import type { AccountRole, TemperatureUnit } from '../auth/auth.types.js';

export interface UpdateProfileRequest {
  displayName?: string;
  timeZone?: string;
  temperatureUnit?: TemperatureUnit;
  language?: Language;
  stageNumbering?: StageNumbering;
}

export interface ChangePasswordRequest {
  currentPassword: string;
  newPassword: string;
}

export interface AdminUserRow {
  id: string;
  email: string;
  displayName: string;
  role: AccountRole;
  createdAt: string;
}

export interface Paged<T> {
  items: T[];
  total: number;
}
