import Link from "next/link";
import { notFound } from "next/navigation";
import { DeliveryQueue } from "@/components/notices/delivery-queue";
import { MailList } from "@/components/notices/mail-list";
import { PageHeader } from "@/components/ui/card";
import { buttonClass } from "@/components/ui/button";
import { pageViewer } from "@/lib/auth/page-access";
import { listOutbox } from "@/lib/data/outbox";
import { listMail } from "@/lib/mail/mailbox";
import { isFakeMailbox } from "@/lib/mail/transport";

export const metadata = { title: "Mailbox" };
export const dynamic = "force-dynamic";

export default async function MailboxPage({ searchParams }: { searchParams: Promise<{ mine?: string }> }) {
  if (!isFakeMailbox()) notFound();
  const viewer = await pageViewer();
  const mine = (await searchParams).mine === "1";
  const [mails, outbox] = await Promise.all([listMail({ to: mine ? viewer.email : undefined, limit: 200 }), listOutbox({ teamId: viewer.teamId, limit: 30 })]);
  return (
    <>
      <PageHeader
        title="Mailbox"
        lead="Development only: the local mail server keeps every message the app sends on this machine, so you can read alerts, invitations and calendar invites without a real inbox."
        actions={
          <Link href={mine ? "/mailbox" : "/mailbox?mine=1"} className={buttonClass({ variant: "secondary", size: "sm" })} data-testid="mailbox-filter">
            {mine ? "Show all mail" : `Only mail to ${viewer.email}`}
          </Link>
        }
      />
      <div className="grid gap-6 lg:grid-cols-[1fr_20rem]">
        <MailList mails={mails} />
        <aside>
          <DeliveryQueue rows={outbox} />
        </aside>
      </div>
    </>
  );
}
