"use client";
import { useEffect } from "react";
import { authClient } from "@/lib/auth/client";

// Server-rendered pages extend the session row but not the cookie; one call per load refreshes both.
export function SessionKeepalive() {
  useEffect(() => {
    void authClient.getSession();
  }, []);
  return null;
}
