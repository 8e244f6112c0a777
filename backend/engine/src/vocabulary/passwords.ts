/**
 * Password rules both tiers state: the API enforces them (and also refuses common passwords),
 * the UI's forms check the same numbers before sending.
 */
export const PASSWORD_RULES = {
  minLength: 10,
  /** bcrypt reads only the first 72 bytes of a password, so a longer one is refused, not cut */
  maxBytes: 72,
} as const;

/** UTF-8 length of a password (what bcrypt counts). */
export function passwordByteLength(password: string): number {
  let bytes = 0;
  for (const char of password) {
    const code = char.codePointAt(0) ?? 0;
    bytes += code < 0x80 ? 1 : code < 0x800 ? 2 : code < 0x10000 ? 3 : 4;
  }
  return bytes;
}

/**
 * Why a password is refused by the rules any tier can check (length and bytes, not the e-mail),
 * or null. The API adds the common-password list.
 */
export function passwordRuleProblem(password: string, email?: string): string | null {
  if ([...password].length < PASSWORD_RULES.minLength) {
    return `Use at least ${PASSWORD_RULES.minLength} characters`;
  }
  if (passwordByteLength(password) > PASSWORD_RULES.maxBytes) {
    return `Use at most ${PASSWORD_RULES.maxBytes} bytes (about ${PASSWORD_RULES.maxBytes} plain letters; accented letters and symbols count 2–4)`;
  }
  const address = email?.trim().toLowerCase();
  if (address) {
    const lowered = password.trim().toLowerCase();
    const localPart = address.split('@')[0] ?? '';
    if (lowered === address || (localPart.length >= 4 && lowered === localPart)) {
      return 'Do not use your e-mail address as your password';
    }
  }
  return null;
}
