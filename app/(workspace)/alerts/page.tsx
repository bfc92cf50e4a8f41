import { AlertInbox } from "@/components/notices/alert-inbox";
import { NotificationSettingsForm } from "@/components/notices/notification-settings-form";
import { PageHeader } from "@/components/ui/card";
import { LoadCaution } from "@/components/ui/caution";
import { pageViewer } from "@/lib/auth/page-access";
import { can } from "@/lib/auth/permissions";

export const metadata = { title: "Alerts" };

export default async function AlertsPage() {
  const viewer = await pageViewer("alerts:view");
  return (
    <>
      <PageHeader
        title="Alerts"
        lead="Load flags raised by the plan (ahead of time) or by what athletes logged. One alert per athlete, flag and week."
      />
      <LoadCaution className="mb-5" />
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,1fr)_20rem]">
        <AlertInbox canManage={can(viewer.role, "alerts:manage", "team")} />
        <aside className="space-y-4">
          <NotificationSettingsForm />
        </aside>
      </div>
    </>
  );
}
