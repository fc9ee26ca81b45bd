import type { Metadata } from "next";
import { ZonesView } from "./zones-view";

export const metadata: Metadata = { title: "Zones" };

export default function ZonesPage() {
  return <ZonesView />;
}
