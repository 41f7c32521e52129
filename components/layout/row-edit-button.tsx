/** The "Edit" button at the end of a Layout table row; its accessible name says what it edits. */
export function RowEditButton({ label, onClick }: { label: string; onClick: () => void }) {
  return (
    <button type="button" onClick={onClick} aria-label={`Edit ${label}`} className="rounded border border-line px-2 py-0.5 text-xs hover:bg-wash">
      Edit
    </button>
  );
}
