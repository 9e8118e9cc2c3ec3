import { IsEmail, IsIn, IsUUID } from 'class-validator';
import { INVITABLE_ROLES, type CreateInvitationRequest, type InvitableRole } from '@broodsilk/shared';
import { IsOptionalNonNull } from '../../common/validators/is-optional-non-null.validator';

export class CreateInvitationDto implements CreateInvitationRequest {
  @IsEmail({}, { message: 'The e-mail address does not look right.' })
  email!: string;

  @IsIn(INVITABLE_ROLES, { message: `The role must be one of: ${INVITABLE_ROLES.join(', ')}.` })
  role!: InvitableRole;

  @IsOptionalNonNull()
  @IsUUID('all', { message: 'memberId must name a party of the project.' })
  memberId?: string;
}
