import { describe, expect, it } from "vitest";
import { groupBy } from "@/lib/group-by";

describe("groupBy", () => {
  it("groups by key in first-seen key order, each group in the items' order", () => {
    const groups = groupBy([{ f: 2, n: "a" }, { f: 1, n: "b" }, { f: 2, n: "c" }], (x) => x.f);
    expect([...groups.keys()]).toEqual([2, 1]);
    expect(groups.get(2)!.map((x) => x.n)).toEqual(["a", "c"]);
    expect(groups.get(1)!.map((x) => x.n)).toEqual(["b"]);
  });

  it("gives an empty map for no items", () => {
    expect(groupBy([], () => 1).size).toBe(0);
  });
});
