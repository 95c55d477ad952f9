/** The look-up key of a name, synonym or CAS number: lower case, letters and digits only. */
export function normaliseName(text: string): string {
  return text.normalize('NFKD').toLowerCase().replace(/[^a-z0-9]/g, '');
}
