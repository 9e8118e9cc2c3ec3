import { parseMoney } from '@broodsilk/shared';
import { words } from '@/lib/i18n';
import { sentence } from '@/lib/sentence';

/** What the price-per-spiderling field shows: the money refusal (too many decimals for the currency, not a number) or a negative price. */
export function priceError(typed: number | string, currency: string): string | null {
  const price = parseMoney(typed, currency);
  if (!price.ok) return sentence(words, price);
  return price.minor < 0 ? words('page.projects.deal.priceNegative') : null;
}
