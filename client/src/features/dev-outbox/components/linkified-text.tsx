import { Anchor } from '@mantine/core';
import { Fragment, type ReactNode } from 'react';

const LINK = /https?:\/\/[^\s<>"]+/g;
// Sentence punctuation after a link is not part of it.
const TRAILING = /[.,;:!?)\]'"]+$/;

/** Splits plain text into text and clickable links; nothing is ever parsed as HTML. */
export function linkify(text: string): ReactNode[] {
  const parts: ReactNode[] = [];
  let last = 0;
  for (const match of text.matchAll(LINK)) {
    const raw = match[0];
    const url = raw.replace(TRAILING, '');
    const start = match.index;
    if (start > last) parts.push(text.slice(last, start));
    parts.push(
      <Anchor key={`${start}-${url}`} href={url} style={{ overflowWrap: 'anywhere' }}>
        {url}
      </Anchor>,
    );
    last = start + url.length;
  }
  if (last < text.length) parts.push(text.slice(last));
  return parts;
}

export function LinkifiedText({ text }: { text: string }) {
  return (
    <>
      {linkify(text).map((part, index) => (
        <Fragment key={index}>{part}</Fragment>
      ))}
    </>
  );
}
