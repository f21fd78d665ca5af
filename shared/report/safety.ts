// The safety notes printed on every customer report, with ANSI Z535 signal words, by kind of equipment.
import type { EquipmentKind } from "../equipment.ts";
import type { ReportSafetyNote } from "../schemas/report.ts";

export const SAFETY_INTRO =
  "These notes are a reminder, not a full set of instructions. Read and follow the manufacturer's operator's manual and the rules where you use the machine; where they say more or differ, they take precedence.";

const fuel: ReportSafetyNote = {
  signal: "WARNING",
  title: "Fuel can catch fire",
  text: "Stop the engine and let it cool before refuelling. Fill outdoors, away from flames, sparks and pilot lights, and do not smoke. Wipe up spills and move the machine away from them before starting. Store fuel only in an approved container. Follow the manufacturer's manual and local fire rules.",
};

const cutting: ReportSafetyNote = {
  signal: "CAUTION",
  title: "Sharp cutting attachment",
  text: "Blades, chains and cutting line can cut even when barely moving. Stop the engine, wait for every moving part to stop and remove the spark plug cap before touching or clearing the cutting attachment. Wear gloves and eye protection. Follow the manufacturer's manual for guards and fitting.",
};

const fan: ReportSafetyNote = {
  signal: "CAUTION",
  title: "Moving fan and thrown debris",
  text: "Keep hands and loose clothing away from the air intake and the outlet, and never point the outlet at people or animals. Wear eye and hearing protection. Follow the manufacturer's manual.",
};

const exhaust: ReportSafetyNote = {
  signal: "DANGER",
  title: "Engine exhaust contains carbon monoxide",
  text: "Carbon monoxide has no colour or smell and can kill within minutes. Run the generator outdoors only, well away from windows, doors and vents, and never in a home, garage, shed or other enclosed space, even with doors open. Use working carbon monoxide alarms indoors. Connect it to a building only through a transfer switch fitted by a licensed electrician. Follow the manufacturer's manual and local codes.",
};

const cuttingKinds: readonly EquipmentKind[] = ["string_trimmer", "chainsaw", "hedge_trimmer", "walk_behind_mower", "tiller", "other"];

/** Most severe first, as a reader should meet them. */
export function safetyNotesFor(kind: EquipmentKind): ReportSafetyNote[] {
  const notes: ReportSafetyNote[] = [];
  if (kind === "generator") notes.push(exhaust);
  notes.push(fuel);
  if (cuttingKinds.includes(kind)) notes.push(cutting);
  if (kind === "leaf_blower") notes.push(fan);
  return notes;
}

/** Printed under the shop's own warranty terms on every report. */
export const WARRANTY_STANDARD_LINE =
  "The manufacturer's warranty terms and your rights under local consumer law prevail over anything in this report.";
