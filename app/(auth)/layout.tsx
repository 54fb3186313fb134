import { Brand } from "@/components/ui/brand";
import { SkipLink } from "@/components/ui/skip-link";

/** Sign-in, sign-up, invitation and reset pages share this plain frame. */
export default function AuthLayout({ children }: { children: React.ReactNode }) {
  return (
    <div className="mx-auto flex min-h-screen max-w-md flex-col px-5 py-8">
      <SkipLink />
      <header>
        <Brand />
      </header>
      <main id="content" tabIndex={-1} className="mt-10 flex-1 focus:outline-none">{children}</main>
      <footer className="mt-8 text-xs text-slate-600">
        Pierwise gives preliminary sizing only; the local building code, the authority having jurisdiction and a
        licensed engineer govern.
      </footer>
    </div>
  );
}
