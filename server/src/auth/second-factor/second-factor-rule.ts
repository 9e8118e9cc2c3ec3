import type { AccountRole } from '@broodsilk/shared';
import { isLocalDemo } from '../../seed/demo-gate';

/**
 * Administrators of a real install must sign in with a second factor (OWASP ASVS 5.0 V6.3.3: MFA
 * for privileged accounts). The local demo's admin, whose password is published anyway, is exempt.
 */
export function secondFactorRequired(role: AccountRole, env: NodeJS.ProcessEnv = process.env): boolean {
  return role === 'admin' && !isLocalDemo(env);
}
