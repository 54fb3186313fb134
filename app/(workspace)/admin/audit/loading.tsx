/** The audit log's shape while a page of events loads. */
export default function AuditLoading() {
  return (
    <div aria-busy="true" aria-label="Loading the audit log" className="animate-pulse space-y-4">
      <div className="h-8 w-48 rounded bg-slate-200" />
      <div className="h-96 rounded-lg border border-slate-200 bg-white" />
    </div>
  );
}
