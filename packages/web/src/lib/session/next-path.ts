/**
 * The page to return to after signing in, from `?next=`. Only a path inside this app is
 * accepted, so a crafted link cannot send a person to another site after they sign in.
 */
export function safeNextPath(value: string | null | undefined, fallback: string): string {
  if (!value || !value.startsWith('/') || value.startsWith('//') || value.startsWith('/\\')) {
    return fallback;
  }
  return value;
}
