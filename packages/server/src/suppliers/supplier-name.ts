/**
 * The key that makes supplier names unique: trimmed, inner white space collapsed, Unicode
 * NFC, lower-cased. "Quillmere  isolation" in a file finds the supplier "Quillmere Isolation".
 */
export function supplierNameKey(name: string): string {
  return name.normalize('NFC').trim().replace(/\s+/g, ' ').toLowerCase();
}

/** The name as stored and shown: trimmed, inner white space collapsed. */
export function cleanSupplierName(name: string): string {
  return name.normalize('NFC').trim().replace(/\s+/g, ' ');
}
