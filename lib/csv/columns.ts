/**
 * The columns of a past-repairs CSV that Rootbench can import: one row per repair that was done.
 * Headers are matched without regard to case, spaces, hyphens or underscores ("Labour minutes" =
 * "labour_minutes"); columns not listed here are ignored. The export writes the same names.
 */
export interface ImportColumn {
  name: string;
  required: boolean;
  what: string;
  example: string;
}

export const IMPORT_COLUMNS: readonly ImportColumn[] = [
  { name: "date", required: true, what: "The day the repair was finished, as YYYY-MM-DD.", example: "2025-03-14" },
  { name: "reference", required: false, what: "Your own job number; must be unique. Left empty, Rootbench numbers the record.", example: "JOB-1042" },
  { name: "family", required: true, what: "Motor family: its slug or its name with the generation.", example: "orvanta-tessel-2" },
  { name: "serial", required: false, what: "Serial number of the drive unit (used to spot repeat returns).", example: "OT2-448120" },
  { name: "riding_use", required: true, what: "road, trail, cargo or commuting.", example: "trail" },
  { name: "caller_kind", required: false, what: "rider or dealer (empty counts as rider).", example: "dealer" },
  { name: "symptom", required: true, what: "The reported symptom: a tree's slug, symptom or title.", example: "clicking-under-load" },
  { name: "cause", required: true, what: "The confirmed cause: its catalogue slug or name.", example: "owc-cage-broken" },
  { name: "parts", required: false, what: "Parts replaced as slug:quantity pairs separated by semicolons (a quantity of 1 may be left off).", example: "owc-uprated:1;crank-seal-double:1" },
  { name: "labour_minutes", required: false, what: "Bench labour in whole minutes (empty counts as 0).", example: "95" },
  { name: "notes", required: false, what: "Free notes, up to 4,000 characters.", example: "Cage cracked at two pockets." },
];

export const headerKey = (header: string) => header.trim().toLowerCase().replace(/[\s_-]+/g, "_");
