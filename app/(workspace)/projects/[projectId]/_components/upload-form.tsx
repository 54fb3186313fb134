"use client";

import { useRouter } from "next/navigation";
import { useRef, useState } from "react";

const MAX_BYTES = 15 * 1024 * 1024;

/** Posts one file to the uploads API; the server sniffs and decides, this only saves a wasted upload. */
export function UploadForm({ projectId }: { projectId: string }) {
  const router = useRouter();
  const form = useRef<HTMLFormElement>(null);
  const [status, setStatus] = useState<{ ok: boolean; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const data = new FormData(e.currentTarget);
    const file = data.get("file");
    if (!(file instanceof File) || file.size === 0) return setStatus({ ok: false, text: "Choose a file to upload (JPEG, PNG, WebP or PDF)." });
    if (file.size > MAX_BYTES) return setStatus({ ok: false, text: `File must be at most 15 MB; this one is ${(file.size / 1024 / 1024).toFixed(1)} MB.` });
    setBusy(true);
    setStatus({ ok: true, text: `Uploading ${file.name}…` });
    try {
      const response = await fetch(`/api/projects/${projectId}/files`, { method: "POST", body: data });
      const json = await response.json().catch(() => ({}));
      if (!response.ok) return setStatus({ ok: false, text: json.errors?.map((x: { message: string }) => x.message).join(" ") ?? "The upload failed; try again." });
      setStatus({ ok: true, text: `Uploaded ${json.file.originalName}.` });
      form.current?.reset();
      router.refresh();
    } catch {
      setStatus({ ok: false, text: "The upload did not reach the server; check the connection and try again." });
    } finally {
      setBusy(false);
    }
  }

  return (
    <form ref={form} onSubmit={submit} className="flex flex-wrap items-end gap-3 rounded-lg border border-dashed border-slate-300 bg-white p-3">
      <div className="min-w-0 flex-1 space-y-1">
        <label htmlFor="upload-file" className="block text-sm font-medium text-slate-800">Add a file</label>
        <input id="upload-file" name="file" type="file" accept="image/jpeg,image/png,image/webp,application/pdf" aria-describedby="upload-hint" className="block w-full text-sm file:mr-3 file:rounded-md file:border-0 file:bg-slate-100 file:px-3 file:py-1.5" />
        <p id="upload-hint" className="text-xs text-slate-500">Site photos (JPEG, PNG, WebP) or PDFs (soil report, drawings), up to 15 MB.</p>
      </div>
      <div className="min-w-48 flex-1 space-y-1">
        <label htmlFor="upload-description" className="block text-sm font-medium text-slate-800">Description</label>
        <input id="upload-description" name="description" maxLength={300} placeholder="e.g. looking south from the barn" className="block w-full rounded-md border border-slate-300 px-3 py-2 text-sm" />
      </div>
      <button type="submit" disabled={busy} className="mb-5 rounded-md bg-accent-700 px-4 py-2 text-sm font-medium text-white hover:bg-accent-800 disabled:opacity-60">{busy ? "Uploading…" : "Upload"}</button>
      <p aria-live="polite" className={`w-full text-sm ${status?.ok === false ? "text-red-700" : "text-slate-700"}`}>{status?.text ?? ""}</p>
    </form>
  );
}
