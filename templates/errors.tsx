/** Error pages: not found, conflict, and the generic failure page. */
export function NotFoundPage(p: { what: string; id: string }) {
  return (
    <>
      <h1>Not found</h1>
      <p>There is no {p.what} “{p.id}”. It may have been deleted or renamed.</p>
      <p><a href="/">Start page</a></p>
    </>
  );
}

export function ProblemPage(p: { title: string; message: string; back?: string }) {
  return (
    <>
      <h1>{p.title}</h1>
      <p class="notice notice-error" role="alert">{p.message}</p>
      <p><a href={p.back ?? '/'}>{p.back ? 'Back' : 'Start page'}</a></p>
    </>
  );
}
