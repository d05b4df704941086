"use client";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { apiJson } from "@/lib/http/client-fetch";

/** Rotate (new token shown once) or revoke a controller's token. */
export function TokenActions({ serial }: { serial: string }) {
  const [message, setMessage] = useState<string | null>(null);
  const [token, setToken] = useState<string | null>(null);
  async function rotate() {
    if (!window.confirm(`Issue a new token for ${serial}? The old one stops working at once; the controller needs the new one.`)) return;
    const r = await apiJson<{ token: string }>(`/api/v1/controllers/${encodeURIComponent(serial)}/token`, { method: "POST", body: {} });
    if (r.ok) setToken(r.data.token);
    else setMessage(r.error.message);
  }
  async function revoke() {
    if (!window.confirm(`Revoke every token of ${serial}? It can no longer download configurations.`)) return;
    const r = await apiJson(`/api/v1/controllers/${encodeURIComponent(serial)}/token`, { method: "DELETE" });
    setMessage(r.ok ? "Revoked." : r.error.message);
  }
  return (
    <div className="space-y-1">
      <div className="flex gap-2">
        <Button size="sm" variant="secondary" onClick={rotate}>
          New token
        </Button>
        <Button size="sm" variant="danger" onClick={revoke}>
          Revoke
        </Button>
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
