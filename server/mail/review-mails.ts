import type { MailMessage } from './transport'

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!)

/** Plain text and HTML from the same paragraphs; one link (absolute) rendered as a button-like anchor. */
function compose(to: string, subject: string, paragraphs: string[], link: { href: string; label: string }, quote?: string | null): MailMessage {
  const text = [...paragraphs, ...(quote ? ['', ...quote.split('\n').map((l) => `> ${l}`)] : []), '', `${link.label}: ${link.href}`, '', '— Touchproof'].join('\n')
  const html = [
    ...paragraphs.map((p) => `<p>${esc(p)}</p>`),
    quote ? `<blockquote style="border-left:3px solid #8aa0c8;margin:0;padding-left:12px">${esc(quote).replace(/\n/g, '<br>')}</blockquote>` : '',
    `<p><a href="${esc(link.href)}">${esc(link.label)}</a></p>`,
    '<p style="color:#555">— Touchproof</p>',
  ].join('')
  return { to, subject, text, html }
}

interface SignRef {
  signName: string
  projectName: string
  revision: number
}

/** To a reviewer: a revision waits for review. */
export function reviewRequestedMail(a: SignRef & { to: string; reviewerName: string; designerName: string; note: string | null; link: string }): MailMessage {
  return compose(
    a.to,
    `Review requested: ${a.signName} (revision ${a.revision})`,
    [`Hello ${a.reviewerName},`, `${a.designerName} submitted revision ${a.revision} of the sign "${a.signName}" in ${a.projectName} for review.`],
    { href: a.link, label: 'Open the review' },
    a.note,
  )
}

/** To the designer: the reviewer returned the sign with comments. */
export function signReturnedMail(a: SignRef & { to: string; designerName: string; reviewerName: string; comment: string; link: string }): MailMessage {
  return compose(
    a.to,
    `Returned: ${a.signName} (revision ${a.revision})`,
    [`Hello ${a.designerName},`, `${a.reviewerName} returned revision ${a.revision} of "${a.signName}" in ${a.projectName} with comments.`],
    { href: a.link, label: 'Open the sign' },
    a.comment,
  )
}

/** To the designer: the revision was signed off. */
export function signedOffMail(a: SignRef & { to: string; designerName: string; reviewerName: string; standard: string; fails: number; justification: string | null; link: string }): MailMessage {
  const paragraphs = [
    `Hello ${a.designerName},`,
    `${a.reviewerName} signed off revision ${a.revision} of "${a.signName}" in ${a.projectName}, checked against ${a.standard}.`,
  ]
  if (a.fails > 0) paragraphs.push(`The check had ${a.fails} failing finding${a.fails === 1 ? '' : 's'}; the reviewer recorded a justification.`)
  paragraphs.push('Any later edit makes a new revision and supersedes this sign-off. The authority having jurisdiction makes the final decision.')
  return compose(a.to, `Signed off: ${a.signName} (revision ${a.revision})`, paragraphs, { href: a.link, label: 'Open the sign' }, a.justification)
}

/** To the client: a proof to look at and answer. */
export function proofSentMail(a: { to: string; organisationName: string; projectName: string; senderName: string; signCount: number; message: string | null; link: string; expiresAt: Date }): MailMessage {
  return compose(
    a.to,
    `Sign proof from ${a.organisationName}: ${a.projectName}`,
    [
      'Hello,',
      `${a.senderName} of ${a.organisationName} sent you a proof of ${a.signCount} sign${a.signCount === 1 ? '' : 's'} for ${a.projectName}. Please look at it and approve it or ask for changes.`,
      `The link works without an account until ${a.expiresAt.toUTCString()}.`,
    ],
    { href: a.link, label: 'Open the proof' },
    a.message,
  )
}

/** To the designer: the client answered the proof. */
export function proofAnsweredMail(a: { to: string; designerName: string; projectName: string; clientEmail: string; clientName: string | null; decision: 'approved' | 'changes-requested'; comment: string | null; link: string }): MailMessage {
  const who = a.clientName ? `${a.clientName} (${a.clientEmail})` : a.clientEmail
  const verb = a.decision === 'approved' ? 'approved' : 'requested changes to'
  return compose(
    a.to,
    `Proof ${a.decision === 'approved' ? 'approved' : 'changes requested'}: ${a.projectName}`,
    [`Hello ${a.designerName},`, `${who} ${verb} the proof for ${a.projectName}.`],
    { href: a.link, label: 'Open the project' },
    a.comment,
  )
}

/** To a reviewer: several signs of one project wait for review (one mail, not one per sign). */
export function reviewBatchRequestedMail(a: { to: string; reviewerName: string; designerName: string; projectName: string; signNames: string[]; note: string | null; link: string }): MailMessage {
  const list = a.signNames.slice(0, 20).join(', ') + (a.signNames.length > 20 ? `, and ${a.signNames.length - 20} more` : '')
  return compose(
    a.to,
    `Review requested: ${a.signNames.length} signs in ${a.projectName}`,
    [`Hello ${a.reviewerName},`, `${a.designerName} submitted ${a.signNames.length} signs of ${a.projectName} for review: ${list}.`],
    { href: a.link, label: 'Open the review queue' },
    a.note,
  )
}
