import "server-only";
import { eq } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db";
import { THEMES, users } from "@/db/schema";
import { defineAction } from "@/lib/actions/define";

export const setThemeInput = z.object({
  theme: z.enum(THEMES, { error: "Pick the light or the dark workshop theme." }),
});

/** Each person's own choice of screen theme, kept with their account; anyone signed in sets only their own. */
export const setThemeAction = defineAction({
  name: "users.theme",
  access: "home:read",
  input: setThemeInput,
  async run(input, { user }) {
    await db.update(users).set({ theme: input.theme }).where(eq(users.id, user.id));
    return { ok: true as const, data: { theme: input.theme }, message: input.theme === "dark" ? "Dark workshop theme on." : "Light theme on." };
  },
});
