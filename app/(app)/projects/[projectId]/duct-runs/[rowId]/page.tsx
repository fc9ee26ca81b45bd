import type { Metadata } from "next";
import { RowWorkingPage, type RowPageProps } from "../../_checking/row-working-page";

export const metadata: Metadata = { title: "Duct run working" };

export default function DuctRunWorkingPage(props: RowPageProps) {
  return <RowWorkingPage sheet="duct_runs" {...props} />;
}
