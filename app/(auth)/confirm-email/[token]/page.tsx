import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getViewer } from "@/server/auth/get-viewer";
import { AuthCard } from "../../auth-card";
import { ConfirmEmailForm } from "./confirm-email-form";

export const metadata: Metadata = { title: "Confirm your address" };

/** The link from the sign-up e-mail: confirming takes a session of the account itself. */
export default async function ConfirmEmailPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const viewer = await getViewer();
  if (!viewer) redirect(`/sign-in?${new URLSearchParams({ callbackUrl: `/confirm-email/${token}` })}`);
  return (
    <AuthCard title="Confirm your address" lead={`Signed in as ${viewer.user.email}.`}>
      <ConfirmEmailForm token={token} email={viewer.user.email} />
    </AuthCard>
  );
}
