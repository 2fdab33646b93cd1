type Change = { target: { value: string } };

// Wires a text control to one key of a form's state and to the schema's message for it (the same path unless the
// payload nests it), so each field states only what differs: its label, unit and input hints.
export function bindFields<T extends object>(values: T, setValues: (next: T) => void, errors: Record<string, string>) {
  return <K extends keyof T & string>(key: K, errorPath: string = key) => ({
    value: values[key],
    onChange: (e: Change) => setValues({ ...values, [key]: e.target.value }),
    error: errors[errorPath],
  });
}

// The same for a control that reports a parsed number. Messages sit under the branch's path; a key the payload may
// leave out shows the default the schema will fill in, so the field never looks blank when it is not.
export function bindNumberFields<T extends object>(values: T, setValues: (next: T) => void, errors: Record<string, string>, path: string) {
  return <K extends keyof T & string>(key: K, fallback?: T[K]) => ({
    value: values[key] ?? fallback,
    onValue: (v: T[K]) => setValues({ ...values, [key]: v }),
    error: errors[`${path}.${key}`],
  });
}
