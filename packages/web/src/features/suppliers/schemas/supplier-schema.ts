import * as yup from 'yup';

export const SUPPLIER_LIMITS = {
  nameMaxLength: 120,
  emailMaxLength: 200,
  phoneMaxLength: 40,
  notesMaxLength: 2000,
} as const;

/** Digits with the usual separators: "+44 20 7946 0000", "(555) 010-0199 ext. 12". */
const PHONE_PATTERN = /^[+()0-9 .\-/x]*[0-9][+()0-9 .\-/xext]*$/i;

export const supplierSchema = yup.object({
  name: yup
    .string()
    .trim()
    .required('Enter the supplier’s name')
    .max(SUPPLIER_LIMITS.nameMaxLength, `Keep the name to ${SUPPLIER_LIMITS.nameMaxLength} characters or fewer`),
  contactEmail: yup
    .string()
    .trim()
    .email('Enter a valid email address, like sales@example.com')
    .max(SUPPLIER_LIMITS.emailMaxLength, `Keep the address to ${SUPPLIER_LIMITS.emailMaxLength} characters or fewer`),
  phone: yup
    .string()
    .trim()
    .matches(PHONE_PATTERN, { message: 'Use digits, spaces and + ( ) - . only', excludeEmptyString: true })
    .max(SUPPLIER_LIMITS.phoneMaxLength, `Keep the number to ${SUPPLIER_LIMITS.phoneMaxLength} characters or fewer`),
  notes: yup.string().max(SUPPLIER_LIMITS.notesMaxLength, `Keep the notes to ${SUPPLIER_LIMITS.notesMaxLength} characters or fewer`),
  active: yup.boolean().required(),
});

export interface SupplierFormValues {
  name: string;
  contactEmail: string;
  phone: string;
  notes: string;
  active: boolean;
}
