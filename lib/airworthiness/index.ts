// Airworthiness rules: pure functions from an aircraft's records to its status and due list.
// They inform the pilot in command, who still decides airworthiness before every flight.

export { calendarDue, daysDue } from "./calendar";
export { hoursDue, hoursLateness, roundHours, formatHours } from "./hours";
export { nextDue, collectCompletions, hoursChain, isHoursBased } from "./next-due";
export { aircraftStatus, itemApplies } from "./status";
export { defaultInspectionItems, usesHundredHour, usesIfr, DEFAULT_DUE_SOON } from "./defaults";
export type * from "./types";
