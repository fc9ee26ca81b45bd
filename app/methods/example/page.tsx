import type { Metadata } from "next";
import { ExampleView } from "./example-view";

export const metadata: Metadata = { title: "Worked example" };

export default function ExamplePage() {
  return <ExampleView />;
}
