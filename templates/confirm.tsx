/** Delete confirmation: a page that names what will go and posts only when the user confirms. */
import { PostForm } from './components.js';

export interface ConfirmDeleteProps {
  readonly what: string;
  readonly name: string;
  readonly action: string;
  readonly cancel: string;
  /** What else goes with it (scenarios, saved results, ...). */
  readonly consequences?: readonly string[];
  /** Why it cannot be deleted now (then no button is offered). */
  readonly blocked?: string;
}

export function ConfirmDeletePage(p: ConfirmDeleteProps) {
  return (
    <>
      <h1>Delete {p.what} “{p.name}”?</h1>
      {p.blocked ? (
        <>
          <p class="notice notice-error" role="alert">{p.blocked}</p>
          <p><a href={p.cancel}>Back</a></p>
        </>
      ) : (
        <>
          {p.consequences && p.consequences.length > 0 ? <ul>{p.consequences.map((c) => <li>{c}</li>)}</ul> : null}
          <p>This cannot be undone.</p>
          <PostForm action={p.action} label={`Delete ${p.what}`}>
            <input type="hidden" name="confirm" value="yes" />
            <p class="actions"><button type="submit" class="danger">Yes, delete {p.what}</button> <a href={p.cancel}>No, keep it</a></p>
          </PostForm>
        </>
      )}
    </>
  );
}
