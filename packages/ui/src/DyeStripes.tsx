/** Three dip-dyed bands: madder, marigold and vat. Our mark beside the wordmark. */
export function DyeStripes() {
  return (
    <span aria-hidden="true" className="flex h-9 w-3 flex-col overflow-hidden rounded-full">
      <span className="flex-1 bg-madder-600" />
      <span className="flex-1 bg-marigold-500" />
      <span className="flex-1 bg-vat-200" />
    </span>
  );
}
