// A label and a sentence typed into the markup instead of read from the catalogue.
export function InlineWords() {
  return (
    <label title="Alive">
      Young counted at the opening
    </label>
  );
}
