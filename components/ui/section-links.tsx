// A row of links to the sections of a long page (settings, judging set-up).
export function SectionLinks({ label, sections }: { label: string; sections: readonly (readonly [id: string, label: string])[] }) {
  return (
    <nav aria-label={label}>
      <ul className="flex flex-wrap gap-2">
        {sections.map(([id, text]) => (
          <li key={id}>
            <a href={`#${id}`} className="inline-flex min-h-tap items-center rounded-control border border-line bg-surface px-3 no-underline hover:bg-plum-50">
              {text}
            </a>
          </li>
        ))}
      </ul>
    </nav>
  );
}
