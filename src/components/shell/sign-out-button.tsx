/** A one-button form that signs out (the action is passed in from app/, where it lives). */
export function SignOutButton({ signOut, className = "" }: { signOut: (form: FormData) => Promise<void>; className?: string }) {
  return (
    <form action={signOut}>
      <button type="submit" className={`rounded-chip border border-line font-medium hover:bg-sunken ${className}`}>
        Sign out
      </button>
    </form>
  );
}
