import type { Metadata } from "next";
import { EmptyState } from "@/components/empty-state";

export const metadata: Metadata = { title: "Firm" };

export default function FirmPage() {
  return (
    <EmptyState title="Firm" lead="Members and their roles, seats and billing, API tokens and the firm's calculation defaults.">
      Firm settings arrive with sign-in.
    </EmptyState>
  );
}
