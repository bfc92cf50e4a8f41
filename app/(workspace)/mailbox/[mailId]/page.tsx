import Link from "next/link";
import { notFound } from "next/navigation";
import { Badge } from "@/components/ui/badge";
import { Card, PageHeader } from "@/components/ui/card";
import { pageViewer } from "@/lib/auth/page-access";
import { isFakeMailbox } from "@/lib/mail/transport";
import { readViewerMail } from "@/lib/notices/mailbox-access";

export const metadata = { title: "Mail" };
export const dynamic = "force-dynamic";

const isCalendar = (contentType: string) => /^(text\/calendar|application\/ics)\b/i.test(contentType);

export default async function MailPage({ params }: { params: Promise<{ mailId: string }> }) {
  if (!isFakeMailbox()) notFound();
  const viewer = await pageViewer("mailbox:view", "own");
  const { mailId } = await params;
  const mail = await readViewerMail({ viewer, id: mailId });
  if (!mail) notFound();
  return (
    <>
      <p className="mb-2 text-sm">
        <Link href="/mailbox" className="text-lane-700 hover:underline">
          ← Mailbox
        </Link>
      </p>
      <PageHeader title={mail.subject || "(no subject)"} />
      <Card className="mb-4 p-4 text-sm" data-testid="mail-headers">
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
          <dt className="text-ink-500">From</dt>
          <dd className="break-all">{mail.from}</dd>
          <dt className="text-ink-500">To</dt>
          <dd className="break-all" data-testid="mail-to">
            {mail.to.join(", ")}
          </dd>
          <dt className="text-ink-500">Received</dt>
          <dd>{new Date(mail.receivedAt).toLocaleString("en-GB")}</dd>
          <dt className="text-ink-500">Message-ID</dt>
          <dd className="font-mono text-xs break-all">{mail.messageId}</dd>
        </dl>
        <a href={`/api/mailbox/${mail.id}/raw`} className="mt-3 inline-block text-lane-700 hover:underline">
          Download .eml
        </a>
      </Card>

      <div className="grid gap-4 xl:grid-cols-2">
        <section>
          <h2 className="mb-2 text-sm font-semibold tracking-wider text-ink-500 uppercase">HTML part</h2>
          {mail.html ? (
            // sandbox="" : no scripts, no same-origin access, links cannot navigate this page.
            <iframe
              title="HTML part"
              sandbox=""
              srcDoc={mail.html}
              className="h-[36rem] w-full rounded-card bg-white ring-1 ring-ink-100"
              data-testid="mail-html"
            />
          ) : (
            <p className="text-sm text-ink-500">No HTML part.</p>
          )}
        </section>
        <section>
          <h2 className="mb-2 text-sm font-semibold tracking-wider text-ink-500 uppercase">Text part</h2>
          <Card className="overflow-x-auto p-4">
            <pre className="font-mono text-xs break-words whitespace-pre-wrap text-ink-800" data-testid="mail-text">
              {mail.text}
            </pre>
          </Card>
        </section>
      </div>

      {mail.attachments.length > 0 ? (
        <section className="mt-6" data-testid="mail-attachments">
          <h2 className="mb-2 text-sm font-semibold tracking-wider text-ink-500 uppercase">Attachments</h2>
          <div className="space-y-3">
            {mail.attachments.map((a, i) => (
              <Card key={i} className="p-4">
                <div className="flex flex-wrap items-center justify-between gap-2">
                  <p className="text-sm font-medium text-ink-900">
                    {a.filename ?? (isCalendar(a.contentType) ? "Calendar part" : `Attachment ${i + 1}`)}{" "}
                    <Badge>{a.contentType}</Badge>
                  </p>
                  <a
                    href={`/api/mailbox/${mail.id}/attachments/${i}`}
                    className="text-sm text-lane-700 hover:underline"
                  >
                    Download
                  </a>
                </div>
                {isCalendar(a.contentType) ? (
                  <pre
                    className="mt-3 max-h-80 overflow-auto font-mono text-2xs whitespace-pre text-ink-700"
                    data-testid="mail-ics"
                  >
                    {a.content}
                  </pre>
                ) : null}
              </Card>
            ))}
          </div>
        </section>
      ) : null}
    </>
  );
}
