import { Link } from "@/components/shell/link";
import { SignOutButton } from "./sign-out-button";

/** Who is signed in and the way out; or the way in. */
export function UserMenu({ user, signOut }: { user?: { name: string | null; email: string }; signOut: (form: FormData) => Promise<void> }) {
  if (!user) {
    return (
      <Link href="/sign-in" className="rounded-chip bg-accent px-3 py-1.5 text-small font-semibold text-accent-ink hover:opacity-90">
        Sign in
      </Link>
    );
  }
  return (
    <div className="flex items-center gap-2">
      <Link href="/account" className="hidden max-w-48 truncate text-small text-muted hover:underline md:inline" title={`${user.email}: your account`}>
        {user.name ?? user.email}
      </Link>
      <SignOutButton signOut={signOut} className="px-2.5 py-1 text-small" />
    </div>
  );
}
