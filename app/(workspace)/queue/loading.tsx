/** The queue's shell while its rows load. */
export default function QueueLoading() {
  return (
    <div aria-busy className="space-y-3">
      <h1 className="text-2xl font-semibold">Review queue</h1>
      <div className="h-9 w-72 animate-pulse rounded bg-slate-200" />
      <div className="h-64 animate-pulse rounded-lg bg-slate-100" />
    </div>
  );
}
