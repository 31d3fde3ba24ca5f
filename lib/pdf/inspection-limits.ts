/**
 * What a visual-and-measured inspection can and cannot tell, in Waygrade's words. Printed on the
 * last page of every report beside the scoring library's notices and the usual safety cautions.
 */
export const INSPECTION_LIMITS: readonly string[] = [
  'The inspection is visual and measured: the inspector looked at the machine, ran it where it was safe to do so and took the readings listed in this report on the day of the visit. Nothing was dismantled beyond opening covers and inspection plates.',
  'Hidden parts (gear teeth and bearings inside closed housings, the inside of motors, wiring inside conduit) are judged from noise, vibration, temperature, oil and play, not seen. Wear there can be worse than the readings suggest.',
  'Readings depend on how the machine stood on the day. A lathe that is moved must be levelled again, and the bed readings can change with its foundation.',
  'A check marked "Not measured" was not done and is not assumed to pass; it lowers the stated confidence instead.',
  'Permissible values come from the machine-tool test standards and common shop practice named beside each check. Where a limit is recalled rather than read from the standard, the report says "from memory".',
  'Repair costs are typical workshop prices and the valuation is an opinion of value on the inspection date; neither is a quote or an offer.',
];
