import 'server-only';
import { mentionedMembers } from '@/lib/comments/mentions';
import { sendMail } from '@/lib/mail/mailer';
import { commentMentionMail } from '@/lib/mail/templates';
import { listMembers } from '@/lib/workspaces/members';

/**
 * E-mails the workspace members a comment mentions, except its author and anyone the body
 * mentioned before an edit. Runs after the comment is saved: a mail server that refuses costs
 * the mail, never the comment.
 */
export async function mailMentions({
  workspaceId,
  circuit,
  commentId,
  authorId,
  body,
  previousBody,
}: {
  workspaceId: string;
  circuit: { id: string; title: string };
  commentId: string;
  authorId: string;
  body: string;
  previousBody?: string;
}): Promise<void> {
  if (!body.includes('@')) return;
  const members = await listMembers({ workspaceId });
  const author = members.find((m) => m.userId === authorId)?.name ?? 'A colleague';
  const others = members.filter((m) => m.userId !== authorId);
  const before = new Set(previousBody === undefined ? [] : mentionedMembers(previousBody, others).map((m) => m.userId));
  for (const member of mentionedMembers(body, others)) {
    if (before.has(member.userId)) continue;
    try {
      await sendMail(
        commentMentionMail({ to: member.email, recipientName: member.name, authorName: author, circuitId: circuit.id, circuitTitle: circuit.title, commentId, body }),
      );
    } catch (error) {
      console.error('[airproof] mention mail not sent', error);
    }
  }
}
