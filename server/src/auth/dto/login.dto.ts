import { IsEmail, IsString, MaxLength } from 'class-validator';
import { Transform } from 'class-transformer';
import type { LoginRequest } from '@broodsilk/shared';
import { keyedBy } from '../../common/filters/validation-exception.factory';

export class LoginDto implements LoginRequest {
  @Transform(({ value }) => (typeof value === 'string' ? value.trim().toLowerCase() : value))
  @IsEmail({}, { context: keyedBy('dto.auth.email') })
  email!: string;

  @IsString()
  @MaxLength(200)
  password!: string;
}
