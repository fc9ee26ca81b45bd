import type { Metadata } from "next";
import { Link } from "@/components/shell/link";
import { ZLinkToken } from "@/schemas/auth";
import { ROLE_LABELS } from "@/schemas/roles";
import { getViewer } from "@/server/auth/get-viewer";
import { findInvitation } from "@/server/services/find-invitation";
import { AuthCard } from "../../auth-card";
import { AcceptForm } from "./accept-form";

export const metadata: Metadata = { title: "Invitation" };

const CLOSED = {
  accepted: "This invitation has already been accepted.",
  revoked: "This invitation was withdrawn by the firm's admin. Ask them for a new one.",
  expired: "This invitation has expired. Ask the firm's admin to send it again.",
} as const;

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = ZLinkToken.safeParse(token).success ? await findInvitation(token) : null;
  const back = <Link href="/sign-in" className="text-accent underline-offset-2 hover:underline">Go to sign-in</Link>;
  if (!invitation) {
    return <AuthCard title="Invitation not found" footer={back}><p>This link is not valid. Copy the whole link from the e-mail, or ask for a new invitation.</p></AuthCard>;
  }
  if (invitation.status !== "open") {
    return <AuthCard title={`Invitation to ${invitation.firmName}`} footer={back}><p>{CLOSED[invitation.status]}</p></AuthCard>;
  }
  const viewer = await getViewer();
  const roles = invitation.roles.map((r) => ROLE_LABELS[r]).join(", ");
  return (
    <AuthCard title={`Join ${invitation.firmName}`} lead={<>Invitation for <strong>{invitation.email}</strong> as {roles}.</>}>
      <AcceptForm
        token={token}
        mode={viewer?.user.email === invitation.email ? "signed-in" : invitation.accountExists ? "existing" : "new"}
        signedInAs={viewer && viewer.user.email !== invitation.email ? viewer.user.email : undefined}
      />
    </AuthCard>
  );
}
