import { Panel } from "@/components/panel";

/** What a member without the admin role sees on the admin pages (the API answers them 403). */
export function AdminOnly() {
  return (
    <Panel title="For firm admins">
      <p className="text-small text-muted">Only a firm admin can manage members, invitations, API tokens and billing. Ask one of your firm's admins if something needs changing.</p>
    </Panel>
  );
}
