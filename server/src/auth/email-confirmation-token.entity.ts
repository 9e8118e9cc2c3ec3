import { Entity, ManyToOne, type Ref } from '@mikro-orm/core';
import { Invitation } from '../invitations/invitation.entity';
import { SingleUseLink } from './single-use-link';

/** A single-use link that confirms a new account's e-mail address; only the SHA-256 of the token is stored. */
@Entity({ tableName: 'email_confirmation_tokens' })
export class EmailConfirmationToken extends SingleUseLink<'invitation'> {
  /** The invitation whose link led to the registration: confirming the address accepts it. */
  @ManyToOne(() => Invitation, { ref: true, nullable: true, deleteRule: 'set null' })
  invitation?: Ref<Invitation> | null = null;
}
