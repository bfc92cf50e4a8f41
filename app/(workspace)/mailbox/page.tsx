import { notFound } from "next/navigation";
import { DeliveryQueue } from "@/components/notices/delivery-queue";
import { MailList } from "@/components/notices/mail-list";
import { PageHeader } from "@/components/ui/card";
import { pageViewer } from "@/lib/auth/page-access";
import { listDeliveryQueue } from "@/lib/data/outbox";
import { isFakeMailbox } from "@/lib/mail/transport";
import { canSeeDeliveryQueue, listViewerMail } from "@/lib/notices/mailbox-access";

export const metadata = { title: "Mailbox" };
export const dynamic = "force-dynamic";

export default async function MailboxPage() {
  if (!isFakeMailbox()) notFound();
  const viewer = await pageViewer("mailbox:view", "own");
  const queue = canSeeDeliveryQueue(viewer);
  const [mails, outbox] = await Promise.all([
    listViewerMail({ viewer, limit: 200 }),
    queue ? listDeliveryQueue({ teamId: viewer.teamId, limit: 30 }) : null,
  ]);
  return (
    <>
      <PageHeader
        title="Mailbox"
        lead={
          <span data-testid="mailbox-local-note">
            This screen exists only while mail stays on this machine: the app sends to a local test mail server, not to
            real inboxes. You see the mail sent to {viewer.email} and nobody else&apos;s. Once a real mail server is set
            up, this screen goes away.
          </span>
        }
      />
      <div className={outbox ? "grid grid-cols-1 items-start gap-6 lg:grid-cols-[minmax(0,1fr)_20rem]" : undefined}>
        <MailList mails={mails} />
        {outbox ? (
          <aside>
            <DeliveryQueue rows={outbox} />
          </aside>
        ) : null}
      </div>
    </>
  );
}
