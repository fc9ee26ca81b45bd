import { Link } from "@/components/shell/link";
import type { ReactNode } from "react";

/** A project's breadcrumb, name and one line about it: the top of every project page. */
export function ProjectTitle({ reference, name, children }: { reference: string; name: string; children: ReactNode }) {
  return (
    <div>
      <p className="text-small text-muted">
        <Link href="/projects" className="hover:underline">
          Projects
        </Link>{" "}
        / <span className="font-mono">{reference}</span>
      </p>
      <h1 className="text-headline font-semibold">{name}</h1>
      <p className="text-small text-muted">{children}</p>
    </div>
  );
}
