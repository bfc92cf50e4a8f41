import { AthleteForm } from "@/components/squad/athlete-form";
import { Card, PageHeader } from "@/components/ui/card";
import { pageViewer } from "@/lib/auth/page-access";
import { listGroups } from "@/lib/data/athletes";

export const metadata = { title: "Add athlete" };

export default async function NewAthletePage() {
  const viewer = await pageViewer("athletes:edit");
  const groups = await listGroups({ teamId: viewer.teamId });
  return (
    <>
      <PageHeader
        title="Add athlete"
        lead="An athlete without a login. To let them sign in and log sessions, add them on the members screen later."
      />
      <Card className="p-5">
        <AthleteForm
          athleteId={null}
          groups={groups}
          initial={{
            name: "",
            groupId: "",
            sex: "",
            birthDate: "",
            bodyMassKg: "",
            vmaxMs: "",
            vmaxTestedOn: "",
            tauS: "",
            stepLengthM: "",
            plyoLevel: "beginner",
          }}
        />
      </Card>
    </>
  );
}
