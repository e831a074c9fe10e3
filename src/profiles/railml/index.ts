/** railML 2.x infrastructure import: the streaming reader, the stretch of line for a note, the note itself. */
export * from "./model.js";
export * from "./reader.js";
export * from "./stretch.js";
export * from "./note.js";
