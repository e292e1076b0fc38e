import { serverEnv } from '@/lib/env';
import type { OutgoingMail } from '@/lib/mail/mailer';
import type { ReviewDecision } from '@/lib/reviews/schemas';

const SAFETY_LINE =
  'Airproof results support, and never replace, a risk assessment under the applicable machinery-safety standards, local codes and a competent person’s sign-off.';

export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c);
}

export function appLink(pathWithQuery: string): string {
  return new URL(pathWithQuery, serverEnv().APP_URL).toString();
}

/**
 * Builds the plain-text and HTML parts from the same paragraphs and one call-to-action link. A
 * quote is someone's own text, shown after the paragraphs with its line breaks kept.
 */
function compose({ to, subject, paragraphs, quote, action }: { to: string; subject: string; paragraphs: string[]; quote?: string; action: { label: string; url: string } }): OutgoingMail {
  const quoted = quote === undefined ? [] : [quote.split('\n').map((line) => `> ${line}`).join('\n')];
  const text = [...paragraphs, ...quoted, `${action.label}: ${action.url}`, '', '— Airproof', SAFETY_LINE].join('\n\n');
  const html = `<!doctype html><html><body style="font-family:system-ui,sans-serif;color:#18212b;max-width:560px">
${[
  ...paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`),
  ...(quote === undefined ? [] : [`<blockquote style="white-space:pre-wrap;margin:0 0 16px;padding:4px 12px;border-left:3px solid #9aa5b1">${escapeHtml(quote)}</blockquote>`]),
].join('\n')}
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

/** Where a review is read: the comparison of the reviewed revision with the one before it. */
function reviewLink({ circuitId, revisionNumber, reviewId }: { circuitId: string; revisionNumber: number; reviewId: string }): string {
  return appLink(`/circuits/${encodeURIComponent(circuitId)}/compare?to=${revisionNumber}&review=${encodeURIComponent(reviewId)}`);
}

export interface ReviewMailSubject {
  circuitId: string;
  circuitTitle: string;
  revisionNumber: number;
  reviewId: string;
}

export function reviewRequestedMail({ to, reviewerName, requesterName, message, ...review }: ReviewMailSubject & { to: string; reviewerName: string; requesterName: string; message: string }): OutgoingMail {
  return compose({
    to,
    subject: `${requesterName} asks you to check revision ${review.revisionNumber} of “${review.circuitTitle}”`,
    paragraphs: [
      `Hello ${reviewerName},`,
      `${requesterName} would like you to check revision ${review.revisionNumber} of the circuit “${review.circuitTitle}”, then approve it or ask for changes.`,
      `Their note: ${message}`,
      'If a newer revision is saved before you decide, this request lapses and a new one is needed.',
    ],
    action: { label: 'Open the comparison', url: reviewLink(review) },
  });
}

export function reviewDecidedMail({ to, requesterName, deciderName, decision, note, ...review }: ReviewMailSubject & { to: string; requesterName: string; deciderName: string; decision: ReviewDecision; note: string | null }): OutgoingMail {
  const what = `revision ${review.revisionNumber} of “${review.circuitTitle}”`;
  return compose({
    to,
    subject: decision === 'approve' ? `${deciderName} approved ${what}` : `${deciderName} asks for changes to ${what}`,
    paragraphs: [
      `Hello ${requesterName},`,
      decision === 'approve'
        ? `${deciderName} has approved ${what}. The approval holds until a newer revision is saved.`
        : `${deciderName} has checked ${what} and asks for changes before approving it.`,
      ...(note ? [`Their note: ${note}`] : []),
    ],
    action: { label: 'Open the comparison', url: reviewLink(review) },
  });
}

export function commentMentionMail({ to, recipientName, authorName, circuitId, circuitTitle, commentId, body }: { to: string; recipientName: string; authorName: string; circuitId: string; circuitTitle: string; commentId: string; body: string }): OutgoingMail {
  return compose({
    to,
    subject: `${authorName} mentioned you on “${circuitTitle}”`,
    paragraphs: [`Hello ${recipientName},`, `${authorName} mentioned you in a comment on the circuit “${circuitTitle}”:`],
    quote: body,
    action: { label: 'Open the comment', url: appLink(`/circuits/${encodeURIComponent(circuitId)}?comment=${encodeURIComponent(commentId)}`) },
  });
}
