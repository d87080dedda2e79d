// The words of the e-mails Warmstead sends. Plain text first (it is what many people read), with
// a simple HTML twin; every value is escaped.
const esc = (s: string) => s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

export type CompanyLine = { name: string; phone?: string | null; email?: string | null };

const contact = (c: CompanyLine) => [c.name, c.phone, c.email].filter(Boolean).join(" · ");

function html(paragraphs: string[], link: { href: string; label: string }, footer: string) {
  const p = (t: string) => `<p style="margin:0 0 16px">${esc(t)}</p>`;
  return [
    `<div style="font-family:Helvetica,Arial,sans-serif;font-size:16px;line-height:1.5;color:#24272a;max-width:560px">`,
    ...paragraphs.map(p),
    `<p style="margin:24px 0"><a href="${esc(link.href)}" style="background:#1f5444;color:#ffffff;padding:12px 20px;border-radius:6px;text-decoration:none;font-weight:bold">${esc(link.label)}</a></p>`,
    `<p style="margin:0 0 16px;font-size:14px;color:#4b5157">If the button does not work, copy this address into your browser:<br>${esc(link.href)}</p>`,
    `<p style="margin:24px 0 0;font-size:14px;color:#4b5157">${esc(footer)}</p>`,
    `</div>`,
  ].join("\n");
}

export function inviteMail(input: { homeownerName: string; company: CompanyLine; street?: string | null; link: string; days: number }) {
  const first = input.homeownerName.split(" ")[0] || input.homeownerName;
  const about = input.street ? ` for ${input.street}` : "";
  const lines = [
    `Hello ${first},`,
    `${input.company.name} has opened a Warmstead account for you. There you can read the savings report and proposal${about} when they are ready, and download them as PDFs.`,
    `Choose a password to get started. The link works once, within ${input.days} days.`,
  ];
  const footer = `Sent by ${contact(input.company)}. If you were not expecting this, you can ignore it.`;
  return {
    subject: `${input.company.name}: set up your Warmstead account`,
    text: [...lines, "", "Set your password:", input.link, "", footer, ""].join("\n"),
    html: html(lines, { href: input.link, label: "Set your password" }, footer),
  };
}

export function signInLinkMail(input: { name: string; companyName: string; link: string; minutes: number }) {
  const first = input.name.split(" ")[0] || input.name;
  const lines = [`Hello ${first},`, `Here is the sign-in link you asked for. It works once, within ${input.minutes} minutes.`];
  const footer = `Sent for ${input.companyName}. If you did not ask for it, ignore this e-mail: nobody can sign in without the link.`;
  return {
    subject: "Your Warmstead sign-in link",
    text: [...lines, "", "Sign in:", input.link, "", footer, ""].join("\n"),
    html: html(lines, { href: input.link, label: "Sign in to Warmstead" }, footer),
  };
}
