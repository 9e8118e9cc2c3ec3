import type { AccountRole, TemperatureUnit } from '../auth/auth.types.js';

export interface UpdateProfileRequest {
  displayName?: string;
  timeZone?: string;
  temperatureUnit?: TemperatureUnit;
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
