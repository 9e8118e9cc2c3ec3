declare module 'fxa-common-password-list' {
  /** True when the password is on the list of well-known common passwords. */
  export function test(password: string): boolean;
}
