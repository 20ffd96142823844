/** What went wrong with the saved list (or one of its set-aside copies): a sentence and the details, announced at once. */
export function ListProblems({ text, details }: { text?: string; details: readonly string[] }) {
  return (
    <div className="library__problems" role="alert">
      {text === undefined ? null : <p>{text}</p>}
      {details.length > 0 ? (
        <ul>
          {details.map((d, i) => (
            <li key={i}>{d}</li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
