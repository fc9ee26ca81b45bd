/** The caution every result screen and report carries. */
export const ENGINEERING_CAUTION =
  "Results are engineering estimates. Every design must be verified by a competent, licensed engineer under the codes and standards that apply where it is built.";

export function EngineeringCaution({ className = "" }: { className?: string }) {
  return (
    <p className={`text-small text-muted ${className}`} role="note">
      <span className="font-semibold text-caution">Engineering caution.</span> {ENGINEERING_CAUTION}
    </p>
  );
}
