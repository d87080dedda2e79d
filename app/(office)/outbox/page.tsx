import type { Metadata } from "next";
import { OutboxList } from "@/components/outbox/outbox-list";
import { can } from "@/lib/authz/permissions";
import { listOutbox } from "@/lib/data/outbox";
import { requireStaffPage } from "@/lib/session";

export const metadata: Metadata = { title: "Outbox" };

export default async function OutboxPage() {
  const user = await requireStaffPage("outbox:read");
  const messages = await listOutbox(user);
  return (
    <>
      <h1 className="text-3xl font-bold text-spruce-900">Outbox</h1>
      <p className="mb-6 text-ink-muted">
        Every e-mail Warmstead sends for your company, newest first. A message that cannot be sent is tried again (after 30 seconds, 2, 10 and 30 minutes), then shown as failed until someone retries it.
      </p>
      <OutboxList messages={messages} canRetry={can(user.role, "outbox:retry")} />
    </>
  );
}
