import { Fragment } from 'react';

/** Text with `code` spans (the API's notes and the access text use backticks for names and headers). */
export function RichText({ text }: { text: string }) {
  return (
    <>
      {text.split('`').map((part, i) =>
        i % 2 === 1 ? (
          <code key={i} className="num rounded bg-muted px-1 wrap-anywhere">
            {part}
          </code>
        ) : (
          <Fragment key={i}>{part}</Fragment>
        ),
      )}
    </>
  );
}

/** A shared schema's section id on the API page. */
export const schemaAnchor = (name: string) => `schema-${name}`;
