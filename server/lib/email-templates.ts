// Every e-mail Stickerline sends is built here, as HTML with a plain-text twin.

export type EmailContent = { subject: string; html: string; text: string };

const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

/** Wraps paragraphs in a plain, readable layout; `paragraphs` are plain text, escaped here. */
export function layout(title: string, paragraphs: string[], action?: { label: string; url: string }): EmailContent {
  const htmlBody = paragraphs.map((p) => `<p style="margin:0 0 12px">${escapeHtml(p).replace(/\n/g, '<br>')}</p>`).join('');
  const button = action
    ? `<p><a href="${escapeHtml(action.url)}" style="background:#5b3a1e;color:#fff;padding:10px 16px;border-radius:4px;text-decoration:none">${escapeHtml(action.label)}</a></p>`
    : '';
  const html = `<!doctype html><html><body style="font-family:Georgia,serif;color:#2b2118;max-width:560px;margin:auto">
<h1 style="font-size:20px">${escapeHtml(title)}</h1>${htmlBody}${button}
<p style="font-size:12px;color:#6b5a4a">Stickerline yard mail</p></body></html>`;
  const text = [title, '', ...paragraphs, ...(action ? ['', `${action.label}: ${action.url}`] : [])].join('\n\n');
  return { subject: title, html, text };
}

export function passwordResetEmail({ name, url }: { name: string; url: string }): EmailContent {
  return layout(
    'Reset your Stickerline password',
    [`Hello ${name},`, 'Someone asked to reset the password for this account. If it was you, use the link below within one hour. If not, you can ignore this message.'],
    { label: 'Choose a new password', url },
  );
}
