/** The longest name an e-mail repeats (greetings, "X invites you"); longer names are cut with "…". */
export const MAIL_NAME_MAX = 40;

// C0/C1 controls, zero-width and bidirectional formatting characters (Unicode TR #9) that could hide or reorder text.
const INVISIBLE = /[\u0000-\u001f\u007f-\u009f\u200b-\u200f\u202a-\u202e\u2060-\u2069\ufeff]/g;
// Anything that a mail program would show as a link or an address.
const LINK_LIKE = /(:\/\/|www\.|@|\.[a-z]{2,}\b)/i;

/**
 * A user-chosen name made safe to repeat in an e-mail to someone else: one line of plain
 * text, no invisible or reordering characters, at most MAIL_NAME_MAX characters, and null
 * when it looks like a link or an address (the mail then words it without the name), so the
 * app cannot be made to deliver somebody's advertisement or phishing link.
 */
export function mailName(name: string): string | null {
  const plain = name.replace(INVISIBLE, ' ').replace(/\s+/g, ' ').trim();
  if (plain === '' || LINK_LIKE.test(plain)) return null;
  const chars = Array.from(plain);
  return chars.length > MAIL_NAME_MAX ? `${chars.slice(0, MAIL_NAME_MAX - 1).join('').trimEnd()}…` : plain;
}
