import { IsEmail, IsIn, IsOptional, IsString, MaxLength, MinLength, ValidateIf } from 'class-validator';
import { INVITABLE_ROLES, type AddMemberRequest, type InvitableRole, TEXT_LIMITS } from '@broodsilk/shared';
import { keyedBy } from '../../common/filters/validation-exception.factory';

export class AddMemberDto implements AddMemberRequest {
  @IsString({ context: keyedBy('dto.project.nameText') })
  @MinLength(1, { context: keyedBy('dto.project.nameNeeded') })
  @MaxLength(TEXT_LIMITS.personName, { context: keyedBy('dto.project.nameMax', { max: TEXT_LIMITS.personName }) })
  name!: string;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsEmail({}, { context: keyedBy('dto.common.emailLooksWrong') })
  email?: string | null;

  @IsIn(INVITABLE_ROLES, { context: keyedBy('dto.common.roleOneOf', { allowed: INVITABLE_ROLES.join(', ') }) })
  role!: InvitableRole;
}
