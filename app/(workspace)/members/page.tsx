import { AddMemberForm } from "@/components/members/add-member-form";
import { InvitationList } from "@/components/members/invitation-list";
import { MemberList } from "@/components/members/member-list";
import { Card, PageHeader } from "@/components/ui/card";
import { pageViewer } from "@/lib/auth/page-access";
import { listUnlinkedAthletes } from "@/lib/data/athletes";
import { listInvitations } from "@/lib/data/invitations";
import { listMembers } from "@/lib/data/members";

export const metadata = { title: "Members" };

export default async function MembersPage() {
  const viewer = await pageViewer("members:manage");
  const [members, invitations, unlinked] = await Promise.all([
    listMembers({ teamId: viewer.teamId }),
    listInvitations({ teamId: viewer.teamId }),
    listUnlinkedAthletes({ teamId: viewer.teamId }),
  ]);
  return (
    <>
      <PageHeader
        title="Members"
        lead={
          "Who can sign in to your club and what each role may do. " +
          "Everyone you add gets an invitation by e-mail and becomes a member only when they accept it."
        }
      />
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <div>
          <MemberList members={members} viewerUserId={viewer.userId} />
          <InvitationList invitations={invitations} />
        </div>
        <Card className="h-fit p-5">
          <h2 className="font-semibold text-ink-950">Invite a member</h2>
          <AddMemberForm unlinkedAthletes={unlinked} />
        </Card>
      </div>
    </>
  );
}
