// The mail log keeps recipients in a 1000-character column. A message to everyone in a role can
// outgrow it; the log then names as many as fit and counts the rest, and the mail still goes out.
export const ADDRESS_LOG_LENGTH = 1000;

export function addressListForLog(to: readonly string[], limit = ADDRESS_LOG_LENGTH): string {
  const all = to.join(', ');
  if (all.length <= limit) return all;
  for (let kept = to.length - 1; kept >= 0; kept--) {
    const text = `${to.slice(0, kept).join(', ')}${kept ? ', ' : ''}and ${to.length - kept} more`;
    if (text.length <= limit) return text;
  }
  return `${to.length} recipients`.slice(0, limit);
}
