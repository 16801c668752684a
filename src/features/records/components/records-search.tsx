import { useState } from 'react';
import { Button } from '../../../components/ui/button';

/** A search box for the approved records; `onSearch` gets the trimmed text (empty for everything). */
export function RecordsSearch({ initial, onSearch }: { initial: string; onSearch: (search: string) => void }) {
  const [text, setText] = useState(initial);
  return (
    <form
      role="search"
      className="mb-4 flex flex-wrap items-end gap-2"
      onSubmit={(event) => {
        event.preventDefault();
        onSearch(text.trim());
      }}
    >
      <div className="flex flex-col gap-1">
        <label htmlFor="records-search" className="font-semibold">
          Search title, analyte, analyst or material
        </label>
        <input
          id="records-search"
          type="search"
          value={text}
          maxLength={200}
          onChange={(event) => setText(event.target.value)}
          className="w-80 rounded-md border border-line-strong bg-surface px-3 py-2 text-ink"
        />
      </div>
      <Button type="submit" variant="secondary">
        Search
      </Button>
      {initial ? (
        <Button
          variant="quiet"
          onClick={() => {
            setText('');
            onSearch('');
          }}
        >
          Show all
        </Button>
      ) : null}
    </form>
  );
}
