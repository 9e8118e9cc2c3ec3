import { IsEmail, IsIn, IsUUID } from 'class-validator';
import { INVITABLE_ROLES, type CreateInvitationRequest, type InvitableRole } from '@broodsilk/shared';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';
import { keyedBy } from '../../common/filters/validation-exception.factory';

export class CreateInvitationDto implements CreateInvitationRequest {
  @IsEmail({}, { context: keyedBy('dto.common.emailLooksWrong') })
  email!: string;

  @IsIn(INVITABLE_ROLES, { context: keyedBy('dto.common.roleOneOf', { allowed: INVITABLE_ROLES.join(', ') }) })
  role!: InvitableRole;

  @IsOptionalNonNull()
  @IsUUID('all', { context: keyedBy('dto.common.memberOfProject') })
  memberId?: string;
}
