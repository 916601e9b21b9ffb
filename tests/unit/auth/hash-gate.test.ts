import { describe, expect, it } from "vitest";
import { HashGate } from "@/lib/auth/hash-gate";

const tick = () => new Promise((r) => setTimeout(r, 5));

describe("the cap on concurrent password hashing", () => {
  it("never runs more than its limit at once and runs everything queued", async () => {
    const gate = new HashGate(2, 10);
    let running = 0;
    let most = 0;
    const work = () => gate.run(async () => {
      running++;
      most = Math.max(most, running);
      await tick();
      running--;
      return 1;
    });
    const results = await Promise.all(Array.from({ length: 8 }, work));
    expect(results).toEqual(Array(8).fill(1));
    expect(most).toBe(2);
    expect(gate.busy).toBe(0);
  });

  it("refuses with a 503 once the queue is full", async () => {
    const gate = new HashGate(1, 1);
    let release!: () => void;
    const first = gate.run(() => new Promise<void>((r) => { release = r; }));
    const second = gate.run(async () => "queued");
    await expect(gate.run(async () => "third")).rejects.toMatchObject({ code: "unavailable", status: 503 });
    release();
    await first;
    expect(await second).toBe("queued");
  });

  it("a failing job frees its place", async () => {
    const gate = new HashGate(1, 5);
    await expect(gate.run(async () => { throw new Error("boom"); })).rejects.toThrow("boom");
    expect(await gate.run(async () => "next")).toBe("next");
  });
});
