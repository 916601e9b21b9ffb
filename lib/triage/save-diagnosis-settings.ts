import "server-only";
import { db } from "@/db";
import { settings } from "@/db/schema";
import { relearnAll } from "@/lib/review/learned";
import { DIAGNOSIS_SETTINGS_KEY, diagnosisSettingsSchema, type DiagnosisSettings } from "./dx-settings";

/**
 * The one writer of the shop's diagnosis settings (there is no screen for them yet): stores them
 * and, in the same transaction, learns every stored likelihood table again, since the authored side
 * of each is worked out with the strength weights. Lock order: the settings row, then the tables in
 * version order (`relearnAll`); no case writer takes the settings row, so no cycle can form.
 */
export async function saveDiagnosisSettings(value: DiagnosisSettings): Promise<void> {
  const parsed = diagnosisSettingsSchema.parse(value);
  await db.transaction(async (tx) => {
    await tx.insert(settings).values({ key: DIAGNOSIS_SETTINGS_KEY, value: parsed })
      .onConflictDoUpdate({ target: settings.key, set: { value: parsed, updatedAt: new Date() } });
    await relearnAll(tx);
  });
}
