import { useDebouncedCallback } from '@mantine/hooks';
import { useEffect, useRef, useState } from 'react';

/** A search box that follows the URL's q (back and forward) and sends what is typed after a pause. */
export function useSearchBox(q: string, onSearch: (q: string) => void) {
  const [text, setText] = useState(q);
  // The q this box last sent: when the URL echoes it back, the person may have typed on meanwhile.
  const sent = useRef(q);
  // The latest onSearch, not the one of the render the typing began in: that one's URL update would put back the
  // filters as they were then, undoing a filter chosen during the pause.
  const latest = useRef(onSearch);
  latest.current = onSearch;
  const search = (value: string) => {
    sent.current = value;
    latest.current(value);
  };
  const send = useDebouncedCallback((value: string) => search(value.trim()), 300);
  useEffect(() => {
    if (q === sent.current) return;
    sent.current = q;
    setText(q);
  }, [q]);

  return {
    text,
    change: (value: string) => {
      setText(value);
      send(value);
    },
    /** Sends now (Enter), without waiting for the pause. */
    flush: () => {
      send.cancel();
      search(text.trim());
    },
    clear: () => {
      send.cancel();
      setText('');
      search('');
    },
  };
}
