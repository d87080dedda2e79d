export { ResultsPanel, type ResultsPanelProps } from "./results-panel";
