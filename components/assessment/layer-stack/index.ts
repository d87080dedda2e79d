export { LayerStackEditor, type LayerStackEditorProps } from "./layer-stack-editor";
export { LayerSection } from "./layer-section";
export { AssemblyLibrary, type AssemblyLibraryProps } from "./assembly-library";
export type { Units } from "./format";
