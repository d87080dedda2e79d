import type { OutboxEntry } from "@/lib/data/outbox";
import { RetryButton } from "./retry-button";

const when = new Intl.DateTimeFormat("en-US", { dateStyle: "medium", timeStyle: "short", timeZone: "America/New_York" });

const kindLabels: Record<string, string> = { invite: "Homeowner invitation", "sign-in-link": "Sign-in link" };

function Status({ m }: { m: OutboxEntry }) {
  const [label, tone] =
    m.status === "sent" ? ["Sent", "bg-spruce-100 text-spruce-800"] : m.status === "failed" ? ["Failed", "bg-danger-bg text-danger"] : m.attempts > 0 ? ["Retrying", "bg-warn-bg text-warn"] : ["Sending", "bg-paper-deep text-charcoal"];
  return <span className={`inline-block rounded-full px-2.5 py-0.5 text-sm font-semibold ${tone}`}>{label}</span>;
}

function timing(m: OutboxEntry) {
  if (m.status === "sent" && m.sentAt) return `sent ${when.format(m.sentAt)}`;
  if (m.status === "queued" && m.attempts > 0 && m.nextAttemptAt) return `next try ${when.format(m.nextAttemptAt)}`;
  if (m.status === "failed") return "no more automatic tries";
  return "";
}

export function OutboxList({ messages, canRetry }: { messages: OutboxEntry[]; canRetry: boolean }) {
  if (messages.length === 0) return <p className="card text-ink-muted">No e-mail has been sent yet. Invitations and sign-in links appear here.</p>;
  return (
    <ul className="divide-y divide-line rounded-lg border border-line bg-white" data-testid="outbox">
      {messages.map((m) => (
        <li key={m.id} className="flex flex-col gap-2 px-4 py-3 sm:flex-row sm:items-start sm:gap-6" data-testid={`mail-${m.id}`}>
          <div className="min-w-0 flex-1">
            <p className="font-semibold break-words">{m.subject}</p>
            <p className="text-sm text-ink-muted break-all">to {m.to}</p>
            <p className="text-sm text-ink-muted">{kindLabels[m.kind] ?? m.kind} · queued {when.format(m.createdAt)}</p>
            {m.lastError && m.status !== "sent" ? <p className="mt-1 text-sm break-words text-danger">Last error: {m.lastError}</p> : null}
          </div>
          <div className="flex flex-col gap-2 sm:w-64 sm:items-end sm:text-right">
            <div className="flex flex-wrap items-center gap-2 sm:justify-end">
              <Status m={m} />
              <span className="text-sm text-ink-muted">{m.attempts} attempt{m.attempts === 1 ? "" : "s"}</span>
            </div>
            <p className="text-sm text-ink-muted">{timing(m)}</p>
            {m.status === "failed" && canRetry ? <RetryButton id={m.id} /> : null}
          </div>
        </li>
      ))}
    </ul>
  );
}
