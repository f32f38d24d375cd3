import { AlertsTable, type AlertRow } from '@/components/alerts-table';

export type CaseAlert = AlertRow;

/** The alerts raised on this case, newest first (the same as on the Alerts page and by e-mail). */
export function WatchAlerts({ alerts }: { alerts: CaseAlert[] }) {
  return (
    <section aria-labelledby="watch-alerts" className="rounded-card border border-line bg-paper-raised p-5 shadow-card">
      <h3 id="watch-alerts" className="mb-3 text-body font-semibold">
        Alerts
      </h3>
      {alerts.length === 0 ? (
        <p className="text-ink-soft">
          No alert yet: one is raised when a right comes into its region or near its boundary, or its window opens or is about to close.
        </p>
      ) : (
        <AlertsTable caption="Alerts on this case" alerts={alerts} />
      )}
    </section>
  );
}
