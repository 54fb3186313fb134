import { Brand } from "@/components/ui/brand";

/** Sign-in, sign-up, invitation and reset pages share this plain frame. */
export default function AuthLayout({ children }: { children: React.ReactNode }) {
  return (
    <div className="mx-auto flex min-h-screen max-w-md flex-col px-5 py-8">
      <Brand />
      <main className="mt-10 flex-1">{children}</main>
      <p className="mt-8 text-xs text-slate-500">
        Pierwise gives preliminary sizing only; the local building code, the authority having jurisdiction and a
        licensed engineer govern.
      </p>
    </div>
  );
}
