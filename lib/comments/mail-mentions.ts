import 'server-only';
import { mentionedMembers } from '@/lib/comments/mentions';
import { sendMail } from '@/lib/mail/mailer';
import { commentMentionMail } from '@/lib/mail/templates';
import { Membership, User } from '@/models';

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
  const memberships = (await Membership.findAll({
    where: { workspaceId },
    include: [{ model: User, as: 'user', attributes: ['id', 'name', 'email'] }],
    order: [['createdAt', 'ASC']],
  })) as Array<Membership & { user: User }>;
  const author = memberships.find((m) => m.userId === authorId)?.user.name ?? 'A colleague';
  const others = memberships.filter((m) => m.userId !== authorId).map((m) => ({ userId: m.userId, name: m.user.name, email: m.user.email }));
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
