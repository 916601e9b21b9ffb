import type { ActionState } from "@/lib/actions/define";

export type FormAction<R> = (prev: ActionState<R>, form: FormData) => Promise<ActionState<R>>;

export interface CauseChoice {
  id: number;
  name: string;
  area: string;
}

export interface PartChoice {
  id: number;
  name: string;
  sku: string;
}

export interface OutcomeDraft {
  causes: { id: number; primary: boolean }[];
  otherCause: string;
  parts: { id: number; quantity: number }[];
  upgrades: string;
  upgradeKinds: string[];
  labourMinutes: number;
  notes: string;
}
