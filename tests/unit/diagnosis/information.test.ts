import { describe, it, expect } from "vitest";
import { entropyBits, expectedInformationGain, rankNextQuestions, type DxTree } from "@/lib/diagnosis";
import { buildTree, question } from "./fixtures";

// T. M. Mitchell, Machine Learning (1997), ch. 3, Table 3.2; data from J. R. Quinlan (1986).
const PLAY_TENNIS = `
D1 Sunny Hot High Weak No
D2 Sunny Hot High Strong No
D3 Overcast Hot High Weak Yes
D4 Rain Mild High Weak Yes
D5 Rain Cool Normal Weak Yes
D6 Rain Cool Normal Strong No
D7 Overcast Cool Normal Strong Yes
D8 Sunny Mild High Weak No
D9 Sunny Cool Normal Weak Yes
D10 Rain Mild Normal Weak Yes
D11 Sunny Mild Normal Strong Yes
D12 Overcast Mild High Strong Yes
D13 Overcast Hot Normal Weak Yes
D14 Rain Mild High Strong No`
  .trim()
  .split("\n")
  .map((line) => line.split(" "));

const ATTRIBUTES = ["outlook", "temperature", "humidity", "wind"] as const;

/**
 * Mapped onto the engine: the classes are two causes with prior weights 9 and 5, each attribute a
 * question whose options carry numeric weights equal to the class counts. The questions are
 * chained so all four are reachable for rankNextQuestions.
 */
function playTennisTree(): DxTree {
  const yes = PLAY_TENNIS.filter((r) => r[5] === "Yes").length;
  const no = PLAY_TENNIS.length - yes;
  return buildTree({
    causes: { yes, no },
    nodes: ATTRIBUTES.map((attribute, a) => {
      const values = [...new Set(PLAY_TENNIS.map((r) => r[a + 1]))];
      return question(
        attribute,
        values.map((value) => ({
          id: `${attribute}-${value}`,
          to: ATTRIBUTES[a + 1] ?? null,
          evidence: {
            yes: PLAY_TENNIS.filter((r) => r[a + 1] === value && r[5] === "Yes").length,
            no: PLAY_TENNIS.filter((r) => r[a + 1] === value && r[5] === "No").length,
          },
        })),
      );
    }),
  });
}

const noUnlisted = { unlistedShare: 0 };

describe("entropy and information gain (Mitchell 1997, Table 3.2)", () => {
  it("H([9+,5-]) of the PlayTennis set", () => {
    const h = entropyBits([9 / 14, 5 / 14]);
    expect(Math.abs(h - 0.940286)).toBeLessThan(1e-4); // Mitchell 1997 ch. 3, exact value recomputed
    expect(Math.abs(h - 0.94)).toBeLessThan(1e-3); // Mitchell 1997 ch. 3, printed 0.940
    expect(entropyBits([9, 5])).toBeCloseTo(h, 12); // counts are normalised first (definition)
  });

  it("entropy edge cases follow 0·log 0 = 0", () => {
    expect(entropyBits([1, 0])).toBe(0); // definition, 0·log 0 = 0 (Mitchell 1997 ch. 3)
    expect(entropyBits([0.5, 0.5])).toBeCloseTo(1, 12); // definition: a fair binary split is 1 bit
  });

  const cases: [string, number, number][] = [
    // [attribute, exact value recomputed, value printed by Mitchell 1997 ch. 3]
    ["outlook", 0.24675, 0.246],
    ["humidity", 0.151836, 0.151],
    ["wind", 0.048127, 0.048],
    ["temperature", 0.029223, 0.029],
  ];
  for (const [attribute, exact, printed] of cases) {
    it(`Gain(S, ${attribute}) equals the engine's expected information gain`, () => {
      const gain = expectedInformationGain(playTennisTree(), [], attribute, noUnlisted);
      expect(Math.abs(gain - exact)).toBeLessThan(1e-4); // Mitchell 1997 ch. 3 (Quinlan 1986 data), exact
      expect(Math.abs(gain - printed)).toBeLessThan(1e-3); // Mitchell 1997 ch. 3, printed value
    });
  }

  it("ranks Outlook first, as ID3 picks it for the root", () => {
    const ranked = rankNextQuestions(playTennisTree(), [], noUnlisted);
    // Mitchell 1997 ch. 3: Outlook has the highest gain, then Humidity, Wind, Temperature.
    expect(ranked.map((r) => r.nodeId)).toEqual(["outlook", "humidity", "wind", "temperature"]);
    // Questions cost 1 minute by default, so gain per minute equals gain.
    expect(ranked[0].gainPerMinute).toBe(ranked[0].gainBits);
  });

  it("an answered question gains nothing more", () => {
    const tree = playTennisTree();
    const answers = [{ nodeId: "outlook", optionId: "outlook-Sunny" }];
    expect(expectedInformationGain(tree, answers, "outlook", noUnlisted)).toBe(0); // definition: its outcome is known
  });
});
