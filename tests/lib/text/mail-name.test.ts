import { describe, expect, it } from 'vitest';
import { MAIL_NAME_MAX, mailName } from '@/lib/text/mail-name';

describe('mailName', () => {
  it('keeps an ordinary name as it is', () => {
    expect(mailName('Maren Østby')).toBe('Maren Østby');
  });

  it('makes one line without control, zero-width or direction-override characters (Unicode TR #9)', () => {
    expect(mailName('Jo\r\nBcc: x\u202Eevil\u200B')).toBe('Jo Bcc: x evil');
  });

  it('leaves out a name that reads as a link or an address', () => {
    for (const name of ['Visit http://x.example', 'www.prize', 'me@there.test', 'cheap-parts.shop']) expect(mailName(name)).toBeNull();
  });

  it(`cuts a long name to ${MAIL_NAME_MAX} characters with an ellipsis`, () => {
    const cut = mailName('A'.repeat(100))!;
    expect(Array.from(cut)).toHaveLength(MAIL_NAME_MAX);
    expect(cut.endsWith('…')).toBe(true);
  });
});
