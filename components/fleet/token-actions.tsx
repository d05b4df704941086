"use client";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { useToast } from "@/components/ui/toast";
import { apiJson } from "@/lib/http/client-fetch";

/** Rotate (new token shown once) or revoke a controller's token, each after a confirmation. */
export function TokenActions({ serial }: { serial: string }) {
  const { notify } = useToast();
  const [message, setMessage] = useState<string | null>(null);
  const [token, setToken] = useState<string | null>(null);
  const url = `/api/v1/controllers/${encodeURIComponent(serial)}/token`;

  async function rotate() {
    setMessage(null);
    const r = await apiJson<{ token: string }>(url, { method: "POST", body: {} });
    if (!r.ok) return setMessage(r.error.message);
    setToken(r.data.token);
    notify({ tone: "success", title: `New token for ${serial}`, description: "Copy it now; it is not shown again." });
  }
  async function revoke() {
    setMessage(null);
    const r = await apiJson(url, { method: "DELETE" });
    setMessage(r.ok ? "Revoked." : r.error.message);
    if (r.ok) {
      setToken(null);
      notify({ tone: "success", title: `Tokens of ${serial} revoked` });
    }
  }
  return (
    <div className="space-y-1">
      <div className="flex gap-2">
        <ConfirmDialog
          trigger={
            <Button size="sm" variant="secondary">
              New token
            </Button>
          }
          title={`Issue a new token for ${serial}?`}
          description="The old token stops working at once. Until the new one is loaded into the controller, it cannot download configurations or check in."
          confirmLabel="Yes, issue a new token"
          onConfirm={rotate}
        />
        <ConfirmDialog
          trigger={
            <Button size="sm" variant="danger">
              Revoke
            </Button>
          }
          title={`Revoke every token of ${serial}?`}
          description="The controller can no longer download configurations or check in. Issue a new token later to let it back."
          confirmLabel="Yes, revoke"
          destructive
          typeToConfirm={{ expected: serial, label: `Type the serial “${serial}” to confirm` }}
          onConfirm={revoke}
        />
      </div>
      {token && <code className="block break-all font-mono text-xs">{token}</code>}
      {message && (
        <p className="text-xs" role="status">
          {message}
        </p>
      )}
    </div>
  );
}
