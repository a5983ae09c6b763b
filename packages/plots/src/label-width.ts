// The width of a label's text, estimated at 0.55 em a character (the plots
// have no font metrics): enough to keep a label inside the frame and clear of
// the lines it would cross.
export function labelWidth(text: string, fontSize: number): number {
  return text.length * fontSize * 0.55;
}
