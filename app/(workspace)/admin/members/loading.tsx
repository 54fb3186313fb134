/** The members page's shape while its lists load. */
export default function MembersLoading() {
  return (
    <div aria-busy="true" aria-label="Loading members" className="animate-pulse space-y-4">
      <div className="h-8 w-72 rounded bg-slate-200" />
      <div className="h-40 rounded-lg border border-slate-200 bg-white" />
      <div className="h-64 rounded-lg border border-slate-200 bg-white" />
    </div>
  );
}
