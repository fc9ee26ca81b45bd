import type { Metadata } from "next";
import { MethodsView } from "./methods-view";

export const metadata: Metadata = { title: "Methods" };

export default function MethodsPage() {
  return <MethodsView />;
}
