import { BadRequestException } from '@nestjs/common';
import type { User } from '../users/user.entity';
import { verifyPassword } from './password-hasher';
import { fieldRefusal, refusal } from '../common/refusal';

/** Re-checks the password of a signed-in user before a change to how they sign in (OWASP ASVS 5.0 V6.2.3: the current password is asked for again). */
export async function assertPassword(user: Pick<User, 'passwordHash'>, password: string, field: string): Promise<void> {
  if (await verifyPassword(user.passwordHash, password)) return;
  throw new BadRequestException({ ...refusal('auth.passwordNotRight'), details: [fieldRefusal(field, 'auth.notCurrentPassword')] });
}
