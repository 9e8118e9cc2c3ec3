import { IsEmail, IsIn, IsOptional, IsString, MaxLength, MinLength, ValidateIf } from 'class-validator';
import { INVITABLE_ROLES, type AddMemberRequest, type InvitableRole, TEXT_LIMITS } from '@broodsilk/shared';

export class AddMemberDto implements AddMemberRequest {
  @IsString({ message: 'The name must be text.' })
  @MinLength(1, { message: 'Give the party a name.' })
  @MaxLength(TEXT_LIMITS.personName, { message: `The name can be at most ${TEXT_LIMITS.personName} characters.` })
  name!: string;

  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsEmail({}, { message: 'The e-mail address does not look right.' })
  email?: string | null;

  @IsIn(INVITABLE_ROLES, { message: `The role must be one of: ${INVITABLE_ROLES.join(', ')}.` })
  role!: InvitableRole;
}
