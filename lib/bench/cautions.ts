import type { AssemblyCaution } from "@/db/schema";

/** The standing cautions of a stage that needs the battery out or the press. */
export const STAGE_CAUTION: Record<Exclude<AssemblyCaution, "none">, { title: string; text: string }> = {
  power: {
    title: "Battery out, power off",
    text: "Remove the battery and disconnect power before opening the drive unit. Treat a damaged or wet lithium-ion battery as a fire risk and store it apart.",
  },
  press: {
    title: "Press work",
    text: "Wear eye protection at the press; support the part fully and press straight, never on the bearing's outer race when fitting to a shaft.",
  },
};

export const DEFER_TO_MAKER =
  "These notes do not replace the motor maker's service documents, local regulations or licensed practice: follow those where they differ.";
