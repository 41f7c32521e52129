/**
 * The place of the EQ designer for the subs (issue 16, part 2) inside the Processor filters tab, under each sub's EQ
 * list. It draws nothing until the designer is built; the panel already gives it the document through useSystem().
 */
export function EqDesignerSlot(): null {
  return null;
}
