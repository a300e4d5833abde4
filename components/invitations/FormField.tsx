/**
 * A labelled input for the server-action forms of the sign-in pages (sign-up, invitation, password reset):
 * the error, else the hint, is tied to the input for screen readers.
 */
export function FormField(props: {
  id: string;
  label: string;
  type?: string;
  autoComplete: string;
  defaultValue?: string;
  error?: string;
  hint?: string;
  readOnly?: boolean;
}) {
  const describedBy = props.error ? `${props.id}-error` : props.hint ? `${props.id}-hint` : undefined;
  return (
    <div>
      <label htmlFor={props.id} className="field-label">{props.label}</label>
      <input
        id={props.id}
        name={props.id}
        type={props.type ?? "text"}
        autoComplete={props.autoComplete}
        defaultValue={props.defaultValue}
        readOnly={props.readOnly}
        aria-invalid={props.error ? true : undefined}
        aria-describedby={describedBy}
        className={props.readOnly ? "field-input bg-chalk-100 text-iron-500" : "field-input"}
      />
      {props.error ? (
        <p id={`${props.id}-error`} className="field-error">{props.error}</p>
      ) : props.hint ? (
        <p id={`${props.id}-hint`} className="mt-1 text-xs text-iron-400">{props.hint}</p>
      ) : null}
    </div>
  );
}

export function FormAlert({ message }: { message: string | null }) {
  return message ? (
    <p role="alert" data-testid="form-error" className="rounded-md bg-ember-50 px-3 py-2 text-sm text-ember-700">
      {message}
    </p>
  ) : null;
}
