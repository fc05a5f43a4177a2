// The one look of every e-mail: a plain-text body and an HTML body built from the same parts.
// Pure (no server imports), so templates are unit-tested without SMTP.

export type MailMessage = { to: string; subject: string; text: string; html: string; kind: string };

export type MailBody = {
  greeting: string;
  paragraphs: string[];
  /** The one thing to do, as a button in HTML and a bare link in text. */
  action?: { label: string; url: string };
  /** Small print under the action, e.g. when a link expires. */
  footnote?: string;
};

export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);
}

const SIGN_OFF = "— Sixteenths, layout math for carpentry classes";

export function composeMail(kind: string, to: string, subject: string, body: MailBody): MailMessage {
  const text = [
    body.greeting,
    "",
    ...body.paragraphs.flatMap((p) => [p, ""]),
    ...(body.action ? [`${body.action.label}: ${body.action.url}`, ""] : []),
    ...(body.footnote ? [body.footnote, ""] : []),
    SIGN_OFF,
  ].join("\n");
  const html = `<!doctype html><html><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"></head><body style="margin:0;padding:24px;background:#f7f5ef;font-family:system-ui,sans-serif;color:#1f2328">
<div style="max-width:560px;margin:0 auto;background:#ffffff;border:1px solid #d8d3c4;border-radius:8px;padding:24px">
<p style="margin:0 0 16px">${escapeHtml(body.greeting)}</p>
${body.paragraphs.map((p) => `<p style="margin:0 0 16px;line-height:1.5">${escapeHtml(p)}</p>`).join("\n")}
${body.action ? `<p style="margin:24px 0"><a href="${escapeHtml(body.action.url)}" style="background:#1d4f91;color:#ffffff;padding:10px 16px;border-radius:6px;text-decoration:none;font-weight:600">${escapeHtml(body.action.label)}</a></p><p style="margin:0 0 16px;font-size:13px;color:#555;overflow-wrap:anywhere;word-break:break-all">Or paste this address into your browser: ${escapeHtml(body.action.url)}</p>` : ""}
${body.footnote ? `<p style="margin:0 0 16px;font-size:13px;color:#555">${escapeHtml(body.footnote)}</p>` : ""}
<p style="margin:24px 0 0;font-size:13px;color:#555">${escapeHtml(SIGN_OFF)}</p>
</div></body></html>`;
  return { kind, to, subject, text, html };
}
