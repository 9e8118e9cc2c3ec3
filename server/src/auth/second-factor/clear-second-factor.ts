import type { EntityManager } from '@mikro-orm/postgresql';
import { User } from '../../users/user.entity';
import { RecoveryCode } from './recovery-code.entity';

export type ClearSecondFactorResult = { ok: true; email: string } | { ok: false; problem: string };

/**
 * For a keeper who lost both the phone and the recovery codes (`npm run clear-second-factor`):
 * removes the second factor and its recovery codes and ends every session, so the next sign-in
 * needs only the password and an administrator is asked to set up a new one. The operator checks
 * who is asking before running it.
 */
export async function clearSecondFactor(em: EntityManager, typedEmail: string): Promise<ClearSecondFactorResult> {
  const email = typedEmail.trim().toLowerCase();
  return em.transactional(async (tx) => {
    const user = await tx.findOne(User, { email });
    if (!user) return { ok: false, problem: `No account uses ${email}; nothing was changed.` };
    if (!user.totpEnabledAt) return { ok: false, problem: `${email} has no second factor; nothing was changed.` };
    Object.assign(user, { totpSecret: null, totpPendingSecret: null, totpEnabledAt: null, totpLastStep: null });
    user.tokenVersion += 1;
    await tx.nativeDelete(RecoveryCode, { user: user.id });
    await tx.flush();
    return { ok: true, email };
  });
}
