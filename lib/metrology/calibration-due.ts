/**
 * A scale past its calibration due date is not used, from the first day after it (the due day itself
 * still counts), whatever its recorded status says until the reminder job catches up. Days are the
 * site's calendar days (yyyy-mm-dd), so the comparison is on the strings.
 */
export function calibrationOverdue(dueAt: string | null, today: string): boolean {
  return dueAt !== null && dueAt < today;
}
