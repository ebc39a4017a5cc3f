// Only same-site paths may be returned to after sign-in: `//host` and `/\host` are read by
// browsers as another host (an open redirect), and absolute URLs are refused outright.
export function safeReturnPath(value: string | null | undefined, fallback = '/'): string {
  if (!value || !value.startsWith('/')) return fallback;
  if (value.startsWith('//') || value.startsWith('/\\')) return fallback;
  if (/[\u0000-\u001f]/.test(value)) return fallback;
  return value;
}

export function signInPath(returnTo?: string): string {
  const safe = safeReturnPath(returnTo, '');
  return safe && safe !== '/' ? `/sign-in?returnTo=${encodeURIComponent(safe)}` : '/sign-in';
}
