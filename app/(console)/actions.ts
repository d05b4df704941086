"use server";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { getAuth } from "@/lib/auth/auth";

/** Ends the current session and returns to the sign-in page. */
export async function signOutAction(): Promise<void> {
  try {
    await getAuth().api.signOut({ headers: await headers() });
  } catch {
    // Already signed out or the session expired: the destination is the same.
  }
  redirect("/sign-in?signedOut=1");
}
