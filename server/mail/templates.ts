import type { MailMessage } from './transport'

const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!)

/** Invitation mail carrying the one-time link where the invitee chooses a password. */
export function invitationMail(args: { to: string; displayName: string; organisationName: string; inviterName: string; link: string; hours: number }): MailMessage {
  const text = [
    `Hello ${args.displayName},`,
    '',
    `${args.inviterName} invited you to ${args.organisationName} on Touchproof.`,
    `Choose your password here (the link works once and expires in ${args.hours} hours):`,
    '',
    args.link,
  ].join('\n')
  const html = `<p>Hello ${escapeHtml(args.displayName)},</p><p>${escapeHtml(args.inviterName)} invited you to ${escapeHtml(args.organisationName)} on Touchproof.</p><p><a href="${escapeHtml(args.link)}">Choose your password</a> (the link works once and expires in ${args.hours} hours).</p>`
  return { to: args.to, subject: `You are invited to ${args.organisationName} on Touchproof`, text, html }
}

/** Password-reset mail. */
export function resetMail(args: { to: string; displayName: string; link: string; minutes: number }): MailMessage {
  const text = [
    `Hello ${args.displayName},`,
    '',
    `Someone asked to reset your Touchproof password. If it was you, choose a new one here (valid ${args.minutes} minutes, once):`,
    '',
    args.link,
    '',
    'If it was not you, ignore this message; your password stays as it is.',
  ].join('\n')
  const html = `<p>Hello ${escapeHtml(args.displayName)},</p><p>Someone asked to reset your Touchproof password. If it was you, <a href="${escapeHtml(args.link)}">choose a new one</a> (valid ${args.minutes} minutes, once).</p><p>If it was not you, ignore this message.</p>`
  return { to: args.to, subject: 'Reset your Touchproof password', text, html }
}
