import { TodayItem, TodaySection } from "@/components/coach/today-section";
import { LogNoteLine, logNoteHref } from "@/components/status/log-note-line";
import { SquadStatusTable } from "@/components/status/squad-status-table";
import { PageHeader } from "@/components/ui/card";
import { pageViewer } from "@/lib/auth/page-access";
import { addDays } from "@/lib/dates/plain-date";
import { teamToday } from "@/lib/dates/zoned";
import { recentLogNotes } from "@/lib/data/log-notes";
import { getSquadStatus } from "@/lib/data/squad-status";

export const metadata = { title: "Squad status" };

/** Notes about pain of the last 7 days shown above the table; more than this are read per athlete. */
const PAIN_NOTES_SHOWN = 8;

export default async function SquadStatusPage() {
  const viewer = await pageViewer("status:view");
  const today = teamToday({ timeZone: viewer.timeZone, now: new Date() });
  const [rows, notes] = await Promise.all([
    getSquadStatus({ teamId: viewer.teamId, today }),
    recentLogNotes({ teamId: viewer.teamId, since: addDays(today, -6), limit: 100 }),
  ]);
  const painNotes = notes.filter((n) => n.aboutPain).slice(0, PAIN_NOTES_SHOWN);
  return (
    <>
      <PageHeader
        title="Squad status"
        lead="Availability, restrictions, open alerts, the latest log note and this week's ratio for every athlete."
      />
      <div className="mb-6">
        <TodaySection
          id="pain-notes"
          title="Notes about pain, last 7 days"
          count={painNotes.length}
          empty="No athlete wrote of pain in a log this week."
        >
          {painNotes.map((n) => (
            <TodayItem key={n.sessionId} href={logNoteHref(n)} testId="pain-note">
              <LogNoteLine note={n} />
            </TodayItem>
          ))}
        </TodaySection>
      </div>
      <SquadStatusTable rows={rows} />
    </>
  );
}
