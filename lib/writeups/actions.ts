import "server-only";
import { defineAction } from "@/lib/actions/define";
import { writeupIdInput, writeupInput } from "./input";
import { publishWriteup, saveWriteup } from "./save";

export const saveWriteupAction = defineAction({
  name: "writeups.save",
  access: "writeup:draft",
  input: writeupInput,
  async run(input, { user }) {
    const saved = await saveWriteup(input, user);
    return { ok: true as const, data: saved, message: saved.status === "published" ? "Published." : "Draft saved." };
  },
});

export const publishWriteupAction = defineAction({
  name: "writeups.publish",
  access: "writeup:publish",
  input: writeupIdInput,
  async run(input, { user }) {
    const published = await publishWriteup(input.id, user);
    return { ok: true as const, data: published, message: "Published." };
  },
});
