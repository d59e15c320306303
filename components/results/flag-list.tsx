import { sortFlags, type Flag, type Severity } from "../../lib/advisory/flag";
import { robustnessSentence } from "../../lib/report/robustness-sentence";

/** How each severity is told: a word and an icon, so the meaning never rests on colour alone. */
export const SEVERITY_PRESENTATION: Record<Severity, { word: string; icon: string }> = {
  warning: { word: "Warning", icon: "▲" },
  caution: { word: "Caution", icon: "◆" },
  info: { word: "Information", icon: "●" },
};

/** The flags of a result, most severe first (`sortFlags`), each with explanation, basis and actions. */
export function FlagList({ flags }: { flags: readonly Flag[] }) {
  const ordered = sortFlags(flags);
  if (ordered.length === 0)
    return (
      <p className="no-flags">
        <span aria-hidden="true">✓ </span>No risk flags were raised for this input. The cautions below still apply.
      </p>
    );
  return (
    <ol className="flag-list" aria-label="Risk flags, most severe first">
      {ordered.map((flag) => {
        const s = SEVERITY_PRESENTATION[flag.severity] ?? SEVERITY_PRESENTATION.info;
        return (
          <li key={flag.id} className={`flag flag-${flag.severity}`} data-severity={flag.severity}>
            <h4>
              <span className="severity-badge">
                <span aria-hidden="true">{s.icon} </span>
                {s.word}
              </span>
              <span className="visually-hidden">: </span> {flag.title}
            </h4>
            <p>{flag.explanation}</p>
            <p className="basis">
              <strong>Basis:</strong> {flag.basis}
            </p>
            {flag.actions.length > 0 ? (
              <div>
                <strong>What to check next:</strong>
                <ul>
                  {flag.actions.map((a) => (
                    <li key={a}>{a}</li>
                  ))}
                </ul>
              </div>
            ) : null}
            {flag.robustness ? (
              <p className="robustness">
                {robustnessSentence(flag.robustness)}
              </p>
            ) : null}
          </li>
        );
      })}
    </ol>
  );
}

/** The cautions, always shown with a result. */
export function CautionList({ cautions }: { cautions: readonly string[] }) {
  return (
    <aside className="cautions" aria-labelledby="cautions-title">
      <h3 id="cautions-title">
        Cautions
      </h3>
      <ul>
        {cautions.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </aside>
  );
}
