import { describe, expect, it } from "vitest";
import { composeInvitation, composePasswordReset, extractLinks, retryDelaySeconds, setPasswordLink } from "@/lib/mail/templates";

describe("set-password links", () => {
  it("points invitations at the welcome form with the token", () => {
    const link = setPasswordLink("http://127.0.0.1:3000", "abcDEF123456", "invitation");
    expect(link).toBe("http://127.0.0.1:3000/set-password?token=abcDEF123456&welcome=1");
  });

  it("points resets at the plain form", () => {
    expect(setPasswordLink("https://roost.example/", "tok_1234567890", "password_reset")).toBe("https://roost.example/set-password?token=tok_1234567890");
  });
});

describe("messages", () => {
  it("puts the link and its lifetime in the invitation text and HTML", () => {
    const link = "http://127.0.0.1:3000/set-password?token=t0k3n12345&welcome=1";
    const mail = composeInvitation({ name: "Ada", link, ttlHours: 72 });
    expect(mail.subject).toMatch(/invitation/i);
    expect(mail.text).toContain(link);
    expect(mail.text).toContain("3 days");
    expect(mail.html).toContain(link.replace(/&/g, "&amp;"));
  });

  it("escapes a name that contains markup", () => {
    const mail = composePasswordReset({ name: "<script>x</script>", link: "http://h/x", ttlHours: 1 });
    expect(mail.html).not.toContain("<script>");
    expect(mail.html).toContain("&lt;script&gt;");
  });

  it("says minutes for links shorter than an hour", () => {
    expect(composePasswordReset({ name: "A", link: "http://h", ttlHours: 0.5 }).text).toContain("30 minutes");
  });
});

describe("link extraction", () => {
  it("finds each http(s) link once, without trailing punctuation", () => {
    const text = "Go to http://a.test/x?y=1. Or https://b.test/z, and again http://a.test/x?y=1";
    expect(extractLinks(text)).toEqual(["http://a.test/x?y=1", "https://b.test/z"]);
  });

  it("finds nothing in plain text", () => {
    expect(extractLinks("no links here")).toEqual([]);
  });
});

describe("retry back-off", () => {
  it("doubles from 15 s and caps at one hour", () => {
    expect([1, 2, 3, 4].map(retryDelaySeconds)).toEqual([15, 30, 60, 120]);
    expect(retryDelaySeconds(20)).toBe(3600);
  });
});
