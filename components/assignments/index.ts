export { AssignPanel, type AthleteOption } from "./AssignPanel";
export { AssignmentList } from "./AssignmentList";
