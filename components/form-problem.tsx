/** The one message a form shows when the server refused it (announced to screen readers). */
export function FormProblem({ message }: { message: string | null }) {
  if (!message) return null;
  return (
    <p role="alert" className="rounded-md bg-brick-100 px-3 py-2 text-brick-700">
      {message}
    </p>
  );
}
