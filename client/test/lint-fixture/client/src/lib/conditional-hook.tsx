import { useState } from 'react';

// A hook called after an early return: react-hooks/rules-of-hooks must flag it.
export function Counter({ hidden }: { hidden: boolean }) {
  if (hidden) return null;
  const [count] = useState(0);
  return <span>{count}</span>;
}
