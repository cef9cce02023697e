/**
 * The small-parts caution, in one place so the CLI, the server and the web app
 * print the same words wherever a material list or kit sheet appears
 * (PRODUCT.md, "Cautions"). It defers to local rules rather than claiming to
 * satisfy any one of them.
 */
export const SMALL_PARTS_CAUTION =
  'Seed beads and needles are small parts: keep away from young children and pets. ' +
  'Kits sold to the public are subject to local product-safety and labelling rules; follow the rules where you sell.';
