import { setIn } from 'formik';

// The server's flat field paths ("points.0.indication") as Formik's nested errors object.
export function toFormikErrors(fields: Record<string, string>): Record<string, unknown> {
  return Object.entries(fields).reduce<Record<string, unknown>>((errors, [path, message]) => setIn(errors, path, message), {});
}
