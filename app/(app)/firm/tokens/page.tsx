import type { Metadata } from "next";
import { hasAnyRole } from "@/server/auth/actor";
import { requirePageActor } from "@/server/auth/get-viewer";
import { listApiTokens } from "@/server/services/list-api-tokens";
import { TokensView } from "./tokens-view";

export const metadata: Metadata = { title: "API tokens" };

export default async function TokensPage() {
  const actor = await requirePageActor("/firm/tokens");
  return <TokensView tokens={hasAnyRole(actor, ["admin"]) ? await listApiTokens(actor) : null} />;
}
