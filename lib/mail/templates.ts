import { serverEnv } from '@/lib/env';
import type { OutgoingMail } from '@/lib/mail/mailer';

const SAFETY_LINE =
  'Airproof results support, and never replace, a risk assessment under the applicable machinery-safety standards, local codes and a competent person’s sign-off.';

export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c);
}

export function appLink(pathWithQuery: string): string {
  return new URL(pathWithQuery, serverEnv().APP_URL).toString();
}

/** Builds the plain-text and HTML parts from the same paragraphs and one call-to-action link. */
function compose({ to, subject, paragraphs, action }: { to: string; subject: string; paragraphs: string[]; action: { label: string; url: string } }): OutgoingMail {
  const text = [...paragraphs, `${action.label}: ${action.url}`, '', '— Airproof', SAFETY_LINE].join('\n\n');
  const html = `<!doctype html><html><body style="font-family:system-ui,sans-serif;color:#18212b;max-width:560px">
${paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join('\n')}
<p><a href="${escapeHtml(action.url)}" style="background:#0f766e;color:#fff;padding:8px 14px;border-radius:4px;text-decoration:none">${escapeHtml(action.label)}</a></p>
<p style="font-size:12px;color:#3b4754">If the button does not work, open this address: ${escapeHtml(action.url)}</p>
<p style="font-size:12px;color:#3b4754">${escapeHtml(SAFETY_LINE)}</p>
</body></html>`;
  return { to, subject, text, html };
}

export function invitationMail({ to, workspaceName, role, inviterName, token, expiresAt }: { to: string; workspaceName: string; role: string; inviterName: string; token: string; expiresAt: Date }): OutgoingMail {
  return compose({
    to,
    subject: `${inviterName} invited you to ${workspaceName} on Airproof`,
    paragraphs: [
      `${inviterName} has invited you to join the workspace “${workspaceName}” on Airproof as ${role}.`,
      `The invitation can be used once and expires on ${expiresAt.toUTCString()}.`,
    ],
    action: { label: 'Accept the invitation', url: appLink(`/invitations/accept?token=${encodeURIComponent(token)}`) },
  });
}

export function passwordResetMail({ to, name, token, expiresAt }: { to: string; name: string; token: string; expiresAt: Date }): OutgoingMail {
  return compose({
    to,
    subject: 'Reset your Airproof password',
    paragraphs: [
      `Hello ${name},`,
      'Someone asked to reset the password of this Airproof account. If it was you, choose a new password with the link below; otherwise ignore this message and nothing changes.',
      `The link works once and expires on ${expiresAt.toUTCString()}.`,
    ],
    action: { label: 'Choose a new password', url: appLink(`/reset-password?token=${encodeURIComponent(token)}`) },
  });
}
