import { IsEmail, IsIn, IsOptional, IsString, MaxLength, MinLength, ValidateIf } from 'class-validator';
import { INVITABLE_ROLES, type AddMemberRequest, type InvitableRole, TEXT_LIMITS } from '@broodsilk/shared';
import { sentence } from '../../common/filters/validation-exception.factory';

export class AddMemberDto implements AddMemberRequest {
  @IsString(sentence('dto.project.nameText'))
  @MinLength(1, sentence('dto.project.nameNeeded'))
  @MaxLength(TEXT_LIMITS.personName, sentence('dto.project.nameMax', { max: TEXT_LIMITS.personName }))
  name!: string;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsEmail({}, sentence('dto.common.emailLooksWrong'))
  email?: string | null;

  @IsIn(INVITABLE_ROLES, sentence('dto.common.roleOneOf', { allowed: INVITABLE_ROLES.join(', ') }))
  role!: InvitableRole;
}
