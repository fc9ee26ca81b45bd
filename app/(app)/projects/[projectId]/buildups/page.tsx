import type { Metadata } from "next";
import { BuildupsView } from "./buildups-view";

export const metadata: Metadata = { title: "Build-ups" };

export default function BuildupsPage() {
  return <BuildupsView />;
}
