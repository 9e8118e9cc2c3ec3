import { shippingCautions, wordsFor } from '@broodsilk/shared';

/**
 * The usual cautions for shipping live invertebrates, shown on the hand-over form and in statements
 * with a shipment: the catalogue's `safety.shipping` texts (docs/trade-facts.md §9), in English for
 * the API; the statement PDF renders them in the reader's language.
 */
export const SHIPPING_CAUTIONS: readonly string[] = shippingCautions(wordsFor('en'));
