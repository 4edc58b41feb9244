/** The short caution on every page that touches cryogens or radioactive sources. */
export function Caution({ children }: { children?: React.ReactNode }) {
  return (
    <aside role="note" className="mb-4 rounded-lg border border-warn/60 bg-warn/10 px-4 py-3 text-sm">
      <p className="font-medium text-warn">
        <span aria-hidden>⚠ </span>Caution
      </p>
      <p className="mt-1">
        {children ??
          "Deepshift records and reminds; it does not certify anything as safe. The laboratory's safety rules, its oxygen-deficiency hazard assessments and its licensed radiation-protection officer decide."}
      </p>
    </aside>
  );
}
