import { describe, expect, it } from "vitest";
import { LineIndex } from "../../lib/import/line-index";

describe("LineIndex", () => {
  it("gives the line of a byte offset, counting CRLF, LF and CR once, also when CRLF is split between chunks", () => {
    // "a\r" | "\nb\n" | "c\rd": lines 1 a, 2 b, 3 c, 4 d
    const index = new LineIndex(1024);
    index.add(Buffer.from("a\r"));
    index.add(Buffer.from("\nb\n"));
    index.add(Buffer.from("c\rd"));
    expect([0, 3, 5, 7].map((offset) => index.lineAt(offset))).toEqual([1, 2, 3, 4]);
    expect(index.lineAt(8)).toBe(4);
  });

  it("forgets chunks beyond what it keeps", () => {
    const index = new LineIndex(4);
    for (let chunk = 0; chunk < 10; chunk++) index.add(Buffer.from("xx\n"));
    expect(index.lineAt(0)).toBeNull();
    // the tenth chunk starts at byte 27 on line 10
    expect(index.lineAt(27)).toBe(10);
  });
});
