import type { CapturedMail } from '@upwell/common';

/** An invitation link's token in a mail body: the link is a credential (anyone holding it can accept). */
const INVITATION_LINK = /\/invitations\/[A-Za-z0-9_-]{16,}/g;

/** What the outbox shows in place of a secret link to anyone but the addressee. */
export const HIDDEN_LINK = '/invitations/[link hidden: only the addressee sees it]';

/**
 * A captured mail as someone other than its addressee may see it in the
 * outbox: that it went, to whom and about what, with every secret link hidden.
 */
export function withSecretLinksHidden(mail: CapturedMail): CapturedMail {
  return {
    ...mail,
    text: mail.text.replace(INVITATION_LINK, HIDDEN_LINK),
    html: mail.html === null ? null : mail.html.replace(INVITATION_LINK, HIDDEN_LINK),
  };
}
