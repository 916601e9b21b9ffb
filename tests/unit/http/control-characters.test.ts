import { describe, expect, it } from "vitest";
import { fieldWithControlCharacter } from "@/lib/http/control-characters";

describe("control characters in input", () => {
  it("finds NUL and other C0 controls and names the field", () => {
    expect(fieldWithControlCharacter({ name: "ok", notes: "a\u0000b" })).toBe("notes");
    expect(fieldWithControlCharacter({ steps: [{ text: "fine" }, { text: "bell\u0007" }] })).toBe("steps.1.text");
    expect(fieldWithControlCharacter({ x: "esc\u001b[31m" })).toBe("x");
    expect(fieldWithControlCharacter({ x: "del\u007f" })).toBe("x");
  });

  it("lets tabs and line breaks through, as multi-line text holds them", () => {
    expect(fieldWithControlCharacter({ notes: "line one\r\nline two\tindented", n: 5, b: true, none: null })).toBeNull();
  });
});
