/** What the caller is asked to bring or post when a unit is booked in. */
export const SEND_KINDS = ["unit", "unit_battery", "bike"] as const;
export type SendKind = (typeof SEND_KINDS)[number];

export const SEND_LABELS: Record<SendKind, string> = {
  unit: "The drive unit only",
  unit_battery: "The drive unit and the battery",
  bike: "The whole bike, dropped off in person",
};

export const BATTERY_POST_WARNING =
  "Lithium-ion batteries are dangerous goods in the post: we accept a battery by post only if your carrier allows " +
  "that battery to be shipped, otherwise please bring it in person. Follow your carrier's and your local rules, and " +
  "never send a battery that is damaged, swollen, wet or hot.";

/** The instruction, written to the caller, that goes on the case and into the summary e-mail. */
export function sendInstructions(kind: SendKind): string {
  switch (kind) {
    case "unit":
      return "Send or bring the drive unit only, without the battery, packed in a sturdy box with padding on every side.";
    case "unit_battery":
      return `Send or bring the drive unit and the battery. ${BATTERY_POST_WARNING} Pack the unit in a sturdy box with padding on every side.`;
    case "bike":
      return "Bring the whole bike to the workshop. Take the battery off for the journey if the bike rides on a car rack, " +
        "and tell us if the battery has been dropped, wet or hot.";
  }
}
