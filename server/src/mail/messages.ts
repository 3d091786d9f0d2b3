import type { OutgoingMail } from './mailer';

const escape = (s: string) => s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

function layout(title: string, paragraphs: string[], action: { label: string; url: string }, footer: string): string {
  return `<!doctype html><html><body style="font-family:Roboto,Arial,sans-serif;color:#1d2530;max-width:560px">
<h2 style="color:#0f5c63">${escape(title)}</h2>
${paragraphs.map((p) => `<p>${escape(p)}</p>`).join('\n')}
<p><a href="${escape(action.url)}" style="background:#0f5c63;color:#fff;padding:10px 18px;border-radius:6px;text-decoration:none">${escape(action.label)}</a></p>
<p style="font-size:13px;color:#555">Or open this address: ${escape(action.url)}</p>
<p style="font-size:12px;color:#777">${escape(footer)}</p>
</body></html>`;
}

/** The invitation e-mail with its accept link. */
export function invitationMail(args: {
  to: string;
  workspaceName: string;
  inviterName: string | null;
  role: string;
  url: string;
  days: number;
}): OutgoingMail {
  const who = args.inviterName ? `${args.inviterName} invites you` : 'You are invited';
  const lines = [
    `${who} to join the workspace "${args.workspaceName}" on Tumblewise as ${args.role}.`,
    `The link works once and expires in ${args.days} days.`,
  ];
  return {
    to: args.to,
    subject: `Join ${args.workspaceName} on Tumblewise`,
    text: `${lines.join('\n')}\n\nAccept the invitation: ${args.url}\n\nIf you did not expect this, ignore this e-mail.`,
    html: layout(
      `Join ${args.workspaceName}`,
      lines,
      { label: 'Accept the invitation', url: args.url },
      'If you did not expect this, ignore this e-mail.',
    ),
  };
}

/** The password-reset e-mail with its single-use link. */
export function passwordResetMail(args: { to: string; name: string; url: string; minutes: number }): OutgoingMail {
  const lines = [
    `Hello ${args.name},`,
    `someone asked to reset the password of your Tumblewise account. The link works once and expires in ${args.minutes} minutes.`,
  ];
  return {
    to: args.to,
    subject: 'Reset your Tumblewise password',
    text: `${lines.join('\n')}\n\nChoose a new password: ${args.url}\n\nIf it was not you, ignore this e-mail; your password stays as it is.`,
    html: layout(
      'Reset your password',
      lines,
      { label: 'Choose a new password', url: args.url },
      'If it was not you, ignore this e-mail; your password stays as it is.',
    ),
  };
}

/** Asks a reviewer to sign a variant off. */
export function reviewRequestMail(args: {
  to: string;
  reviewerName: string;
  requesterName: string;
  variantLabel: string;
  partName: string;
  message: string;
  url: string;
}): OutgoingMail {
  const lines = [
    `Hello ${args.reviewerName},`,
    `${args.requesterName} asks you to review ${args.variantLabel} of "${args.partName}" and approve it or send it back.`,
    ...(args.message ? [`Their note: ${args.message}`] : []),
  ];
  return {
    to: args.to,
    subject: `Review requested: ${args.partName} ${args.variantLabel}`,
    text: `${lines.join('\n')}\n\nOpen the variant: ${args.url}`,
    html: layout(
      `Review ${args.partName} ${args.variantLabel}`,
      lines,
      { label: 'Open the variant', url: args.url },
      'You receive this because you are a reviewer in this workspace.',
    ),
  };
}

const money = (cents: number, currency: string) =>
  new Intl.NumberFormat('en-GB', { style: 'currency', currency: currency.toUpperCase() }).format(cents / 100);

/** Receipt for a paid invoice. */
export function receiptMail(args: {
  to: string;
  workspaceName: string;
  amount: number;
  currency: string;
  number: string | null;
  url: string;
}): OutgoingMail {
  const lines = [
    `We received ${money(args.amount, args.currency)} for the workspace "${args.workspaceName}"${args.number ? ` (invoice ${args.number})` : ''}. Thank you.`,
  ];
  return {
    to: args.to,
    subject: `Receipt: ${args.workspaceName} — ${money(args.amount, args.currency)}`,
    text: `${lines.join('\n')}\n\nInvoices: ${args.url}`,
    html: layout('Payment received', lines, { label: 'See invoices', url: args.url }, 'You receive this as an owner of the workspace.'),
  };
}

/** A payment failed: the workspace is past due and turns read-only after the grace period. */
export function paymentFailedMail(args: { to: string; workspaceName: string; readOnlyFrom: Date | null; url: string }): OutgoingMail {
  const lines = [
    `The latest payment for the workspace "${args.workspaceName}" failed.`,
    args.readOnlyFrom
      ? `Please update the payment method before ${args.readOnlyFrom.toISOString().slice(0, 10)}; after that the workspace becomes read-only (exports keep working).`
      : 'Please update the payment method.',
  ];
  return {
    to: args.to,
    subject: `Payment failed: ${args.workspaceName}`,
    text: `${lines.join('\n')}\n\nUpdate the payment method: ${args.url}`,
    html: layout(
      'Payment failed',
      lines,
      { label: 'Update the payment method', url: args.url },
      'You receive this as an owner of the workspace.',
    ),
  };
}
