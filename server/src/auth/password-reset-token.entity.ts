import { Entity } from '@mikro-orm/core';
import { SingleUseLink } from './single-use-link';

/** A single-use reset link; only the SHA-256 of the token is stored. */
@Entity({ tableName: 'password_reset_tokens' })
export class PasswordResetToken extends SingleUseLink {}
