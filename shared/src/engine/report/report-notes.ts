/** The cautions every spin report carries (PRODUCT.md "Cautions shown in the product"). */
export const STANDARD_NOTES: readonly string[] = [
  'Figures are engineering estimates from idealised geometry and nominal densities.',
  'Category checks are indicative only: conformance is decided by the governing body’s own test.',
  'Thrown and swung implements can injure: test prototypes in a cleared area under your organisation’s safety rules.',
];
