import type { Metadata } from "next";
import { Link } from "@/components/shell/link";
import { AuthCard } from "../../auth-card";

export const metadata: Metadata = { title: "Check your e-mail" };

export default async function CheckEmailPage({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const { email } = await searchParams;
  return (
    <AuthCard title="Check your e-mail" footer={<Link href="/sign-in" className="text-accent underline-offset-2 hover:underline">Back to sign-in</Link>}>
      <p>
        If {email ? <strong>{email}</strong> : "that address"} has a Filmsheet account, a sign-in link is on its way. It works once, for 15 minutes.
      </p>
      <p className="text-small text-muted">Nothing after a few minutes? Look in the spam folder, or ask for a new link.</p>
    </AuthCard>
  );
}
