// Server-rendered markup of the editor's views: no browser here, so this checks what the first paint
// carries (labels, limits, cautions, overlay choices), not interaction.
import { readFileSync } from "node:fs";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { checkDocument } from "@/components/profiles/editor/check-document";
import { EDITOR_CAUTION } from "@/components/profiles/editor/editor-parts";
import { FieldsView, type FieldsViewProps } from "@/components/profiles/editor/fields-view";
import { ProfileWorkbench } from "@/components/profiles/editor/profile-workbench";
import type { JsonObject } from "@/lib/profiles/json";

const fixtureText = (name: string) => readFileSync(new URL(`../fixtures/profiles/${name}`, import.meta.url), "utf8");
const fixture = (name: string) => JSON.parse(fixtureText(name)) as JsonObject;
const now = new Date("2026-03-01T12:00:00Z");
const escaped = (s: string) => s.replace(/'/g, "&#x27;");

function fields(props: Partial<FieldsViewProps> & Pick<FieldsViewProps, "layer" | "doc">): string {
  const text = JSON.stringify(props.doc);
  const check = checkDocument({ version: 2, layer: props.layer, text, baseValues: props.baseValues, now });
  return renderToStaticMarkup(
    createElement(FieldsView, {
      version: 2,
      unusable: null,
      effective: check.effective,
      problems: check.problems,
      readOnly: false,
      idPrefix: "t",
      onDocument: () => {},
      onShowText: () => {},
      ...props,
    }),
  );
}

describe("ProfileWorkbench markup", () => {
  it("renders both tabs, the actions and the Fields view without a browser", () => {
    const html = renderToStaticMarkup(
      createElement(ProfileWorkbench, { version: 2, layer: "base", initialText: fixtureText("v2-base-henhouse-350.json"), initialView: "fields", onSave: () => {}, onSubmit: () => {} }),
    );
    expect(html).toContain('role="tablist"');
    expect(html).toMatch(/role="tab"[^>]*aria-selected="true"[^>]*>Fields</);
    expect(html).toContain("Submit for review");
    expect(html).toContain("Stall velocity threshold");
    expect(html).toContain("Keys");
  });

  it("leaves out Save and Submit when read only", () => {
    const html = renderToStaticMarkup(
      createElement(ProfileWorkbench, { version: 2, layer: "base", initialText: "{}", readOnly: true, onSave: () => {}, onSubmit: () => {} }),
    );
    expect(html).not.toContain(">Save<");
    expect(html).not.toContain("Submit for review");
    expect(html).toContain("Read only");
  });
});

describe("FieldsView markup", () => {
  it("labels each field with its unit and limits and shows the caution by safety-relevant sections", () => {
    const html = fields({ layer: "base", doc: fixture("v2-base-henhouse-350.json") });
    expect(html).toContain('<label for="t-f-closeTravelCounts"');
    expect(html).toMatch(/100 to 200000 counts · default \d+/);
    expect(html).toContain(escaped(EDITOR_CAUTION));
    expect(html.split(escaped(EDITOR_CAUTION)).length - 1).toBe(3);
    expect(html).toContain('type="radio"');
    expect(html).toContain("Sun-following schedule");
  });

  it("puts the error next to an out-of-range field and points aria-describedby at it", () => {
    const html = fields({ layer: "base", doc: { ...fixture("v2-base-henhouse-350.json"), debounceMs: 0 } });
    expect(html).toMatch(/id="t-f-debounceMs"[^>]*aria-describedby="t-f-debounceMs-error/);
    expect(html).toContain('id="t-f-debounceMs-error"');
    expect(html).toContain("must be at least 1 ms");
  });

  it("offers set-here or inherited for each overlay value, with the value beneath", () => {
    const base = fixture("v2-base-henhouse-350.json");
    const html = fields({ layer: "site", doc: fixture("v2-site-overlay.json"), baseValues: base });
    expect(html).toContain('aria-label="Set Close travel in this layer"');
    expect(html).toContain("Inherited: <span class=\"font-mono\">17112 counts</span> (from base)");
    expect(html).toMatch(/aria-label="Set Site time zone in this layer"[^>]*checked/);
  });

  it("locks the schedule's fields as set here when the overlay changes the form", () => {
    const base = fixture("v2-base-henhouse-350.json");
    const overlay = { schedule: { kind: "fixed", openAt: "06:30", closeAt: "21:30", stepMinutes: 30 } };
    const html = fields({ layer: "controller", doc: overlay, baseValues: base });
    const toggle = /<input[^>]*aria-label="Set Close time in this layer"[^>]*>/.exec(html)?.[0] ?? "";
    expect(toggle).toContain('checked=""');
    expect(toggle).toContain('disabled=""');
    expect(html).toContain("This layer changes the schedule form");
  });

  it("asks for the Text view when the document is not an object", () => {
    const html = renderToStaticMarkup(
      createElement(FieldsView, { version: 2, layer: "base", doc: null, unusable: "The text is not valid JSON: oops", effective: null, problems: [], readOnly: false, idPrefix: "t", onDocument: () => {}, onShowText: () => {} }),
    );
    expect(html).toContain("The text is not valid JSON: oops");
    expect(html).toContain("Fix it in the Text view");
  });
});
