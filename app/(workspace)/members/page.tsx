import { AddMemberForm } from "@/components/members/add-member-form";
import { MemberList } from "@/components/members/member-list";
import { Card, PageHeader } from "@/components/ui/card";
import { pageViewer } from "@/lib/auth/page-access";
import { listUnlinkedAthletes } from "@/lib/data/athletes";
import { listMembers } from "@/lib/data/members";

export const metadata = { title: "Members" };

export default async function MembersPage() {
  const viewer = await pageViewer("members:manage");
  const [members, unlinked] = await Promise.all([listMembers({ teamId: viewer.teamId }), listUnlinkedAthletes({ teamId: viewer.teamId })]);
  return (
    <>
      <PageHeader title="Members" lead="Who can sign in to your club and what each role may do. New members set their own password from a one-time link." />
      <div className="grid gap-6 lg:grid-cols-[1fr_22rem]">
        <MemberList members={members} viewerUserId={viewer.userId} />
        <Card className="h-fit p-5">
          <h2 className="font-semibold text-ink-950">Add a member</h2>
          <AddMemberForm unlinkedAthletes={unlinked} />
        </Card>
      </div>
    </>
  );
}
