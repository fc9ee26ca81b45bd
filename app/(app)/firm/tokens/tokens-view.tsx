import { PageHeader, Panel } from "@/components/panel";
import { ROLE_LABELS } from "@/schemas/roles";
import type { TApiToken } from "@/server/repositories/api-tokens";
import { AdminOnly } from "../admin-only";
import { FirmNav } from "../firm-nav";
import { NewTokenForm } from "./new-token-form";
import { RevokeTokenButton } from "./revoke-token-button";

const when = (d: Date | string | null) => (d === null ? "never" : new Date(d).toLocaleString("en-GB", { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit" }));
const STATUS_TONE = { active: "text-ok", expired: "text-caution", revoked: "text-muted" } as const;

export function TokensView({ tokens }: { tokens: TApiToken[] | null }) {
  return (
    <div className="grid gap-6">
      <PageHeader
        title="API tokens"
        lead={
          <>
            For scripts and other programs: send <code className="font-mono text-small">Authorization: Bearer &lt;token&gt;</code> to any <code className="font-mono text-small">/api</code> route. A token acts with its one role, for this firm only.
          </>
        }
      />
      <FirmNav current="/firm/tokens" isAdmin={tokens !== null} />
      {tokens === null ? (
        <AdminOnly />
      ) : (
        <>
          <NewTokenForm />
          <Panel title="Tokens" lead="The secret is never shown again; its first characters tell tokens apart.">
            {tokens.length === 0 ? (
              <p className="text-small text-muted">No tokens yet.</p>
            ) : (
              <div className="overflow-x-auto">
                <table className="w-full text-left text-small">
                  <thead className="text-micro uppercase text-muted">
                    <tr>
                      {["Name", "Starts with", "Role", "Made by", "Status", "Expires", "Last used", ""].map((h) => (
                        <th key={h} className="py-2 pr-4 font-medium">{h}</th>
                      ))}
                    </tr>
                  </thead>
                  <tbody>
                    {tokens.map((t) => (
                      <tr key={t.id} className="border-t border-line">
                        <td className="py-2 pr-4 font-medium">{t.name}</td>
                        <td className="py-2 pr-4 font-mono">{t.prefix}…</td>
                        <td className="py-2 pr-4">{ROLE_LABELS[t.role]}</td>
                        <td className="py-2 pr-4" title={t.created_by?.email}>
                          {t.created_by ? (t.created_by.name ?? t.created_by.email) : <span className="text-muted" title="Made before makers were recorded, or by an account that no longer exists">unknown</span>}
                        </td>
                        <td className={`py-2 pr-4 font-medium ${STATUS_TONE[t.status]}`}>{t.status}</td>
                        <td className="py-2 pr-4 text-muted">{when(t.expires_at)}</td>
                        <td className="py-2 pr-4 text-muted">{when(t.last_used_at)}</td>
                        <td className="py-2">{t.status === "revoked" ? null : <RevokeTokenButton tokenId={t.id} name={t.name} />}</td>
                      </tr>
                    ))}
                  </tbody>
                </table>
              </div>
            )}
          </Panel>
        </>
      )}
    </div>
  );
}
