import type { Metadata } from "next";
import { SignOutButton } from "@/components/shell/sign-out-button";
import { signOutAction } from "../actions";
import { AuthCard } from "../auth-card";

export const metadata: Metadata = { title: "No firm" };

export default function NoFirmPage() {
  return (
    <AuthCard title="You are not in a firm" lead="Your account is not a member of any firm at the moment, for example because an admin removed it.">
      <p>Ask a firm admin to invite you again, or create a firm of your own.</p>
      <div>
        <SignOutButton signOut={signOutAction} className="px-3 py-2 text-small" />
      </div>
    </AuthCard>
  );
}
