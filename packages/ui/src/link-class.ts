/** An inline text link that is still a 48px touch target. */
export const textLinkClass =
  'inline-flex min-h-12 items-center rounded-md font-bold text-vat-700 underline underline-offset-4 hover:text-vat-900';
