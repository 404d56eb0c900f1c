// The cautions shown wherever the panel checks' results are shown (the checks page, the submittal, the
// motor list and the change report).
export const CHECK_CAUTIONS = [
  'Results support, not replace, a qualified person’s design; a qualified person verifies them.',
  'Local codes, the authority having jurisdiction, and the listing and instructions of the equipment take precedence.',
  'De-energise and lock out before work. Check motor rotation before coupling the load.',
];
