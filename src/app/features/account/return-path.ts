/** Only same-site paths are followed after sign-in, so a link cannot bounce users to another site. */
export function safeReturnPath(value: string | undefined): string {
  return value && value.startsWith('/') && !value.startsWith('//') ? value : '/hay';
}
