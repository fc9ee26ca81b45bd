import type { Metadata } from "next";
import { RowWorkingPage, type RowPageProps } from "../../_checking/row-working-page";

export const metadata: Metadata = { title: "Surface working" };

export default function SurfaceWorkingPage(props: RowPageProps) {
  return <RowWorkingPage sheet="surfaces" {...props} />;
}
