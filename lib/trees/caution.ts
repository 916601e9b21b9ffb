/** Shown with every check that needs the unit opened, in the editor and when walked. */
export const OPENING_CAUTION =
  "Before opening the unit: take the battery off and disconnect all power. Treat a damaged or wet lithium-ion battery as a fire risk and store it apart, away from the bench. Wear eye protection at the press. Follow the motor maker's service documents, local regulations and licensed practice; this tree does not replace them.";
