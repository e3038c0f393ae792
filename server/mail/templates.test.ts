import { describe, expect, it } from 'vitest';
import { addressCheckMail, invitationMail, passwordResetMail, quotedName, signUpAgainMail } from './templates.ts';

// Names in mail are chosen by whoever made the workspace or account: a stranger can name a
// workspace after a link or a fake instruction. Mail readers turn text that looks like a URL,
// a domain or an address into a link (common practice: "defanging" such text stops that).
const hostile = 'Payroll\r\nVisit https://evil.example/login?x=1 or www.evil.example, write to boss@evil.example\u202E\u0000' + 'x'.repeat(200);
const linkish = /https?:\/\/|www\.[a-z]|[a-z0-9-]+\.[a-z]{2,}\b|[\w.]+@[\w-]+\.[a-z]/i;

describe('names in mail', () => {
  it('are quoted, one line, at most 100 characters, with no control or direction characters and nothing a reader would link', () => {
    const q = quotedName(hostile);
    expect(q.startsWith('"') && q.endsWith('"')).toBe(true);
    expect(q.length).toBeLessThanOrEqual(102);
    expect(q).not.toMatch(/[\p{Cc}\u202E]/u);
    expect(q).not.toMatch(linkish);
    expect(q).toContain('evil[.]example');
  });

  it('leave an ordinary name as it was', () => {
    expect(quotedName('J. Ellery-Voss')).toBe('"J. Ellery-Voss"');
    expect(quotedName('Chassis — rear axle')).toBe('"Chassis — rear axle"');
  });

  it('carry only the real link in every template, whatever the names say', () => {
    const link = 'http://ridewright.test/x/TOKEN';
    const expiresAt = new Date('2026-01-01T00:00:00Z');
    const mails = [
      invitationMail({ workspaceName: hostile, invitedBy: hostile, role: 'viewer', link, expiresAt }),
      passwordResetMail({ name: hostile, link, expiresAt }),
      addressCheckMail({ name: hostile, link, expiresAt }),
      signUpAgainMail({ name: hostile, signInLink: link, resetLink: link }),
    ];
    for (const m of mails) {
      expect(m.subject).not.toMatch(/[\r\n]/);
      const withoutLink = `${m.subject}\n${m.text}`.replaceAll(link, '');
      expect(withoutLink).not.toMatch(/https?:\/\/|evil\.example/);
      expect(m.text).toContain(link);
    }
  });
});
