import { Link } from "@/components/shell/link";

export default function NotFound() {
  return (
    <div className="grid gap-3">
      <h1 className="text-headline font-semibold">Page not found</h1>
      <p className="text-muted">There is nothing at this address.</p>
      <Link href="/" className="text-accent underline underline-offset-4">
        Back to the start
      </Link>
    </div>
  );
}
