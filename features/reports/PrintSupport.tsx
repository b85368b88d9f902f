// On phones and tablets there is no print dialog: the report is read on screen.
export function PrintStyle(): null {
  return null;
}

export function PrintButton(): null {
  return null;
}
