import "server-only";

/** The closing line of every project e-mail: why it came, and how to stop it. */
export function projectEmailNote(firmName: string): string {
  return `You receive this as a member of ${firmName} on Filmsheet. To stop e-mail about this project, use “Mute e-mail” on the project's Check or Revisions page.`;
}

/** "TS-2417 Larchfield Community Library, extension" */
export const projectTitle = (p: { reference: string; name: string }) => `${p.reference} ${p.name}`;
