import { create } from 'qrcode';
import { useMemo } from 'react';

/**
 * A QR code drawn as SVG squares, made here from the link itself (no outside service), so the
 * host can put it in the stream overlay or hold the screen up to the camera.
 */
export function QrCode({
  text,
  label,
  className,
}: {
  text: string;
  label: string;
  className?: string;
}) {
  const { size, cells } = useMemo(() => {
    const { modules } = create(text, { errorCorrectionLevel: 'M' });
    const dark: string[] = [];
    for (let row = 0; row < modules.size; row++) {
      for (let col = 0; col < modules.size; col++) {
        if (modules.get(row, col)) dark.push(`M${col} ${row}h1v1h-1z`);
      }
    }
    return { size: modules.size, cells: dark.join('') };
  }, [text]);
  // A quiet zone of four modules on every side, as the QR standard asks (ISO/IEC 18004).
  const quiet = 4;
  return (
    <svg
      role="img"
      aria-label={label}
      viewBox={`${-quiet} ${-quiet} ${size + 2 * quiet} ${size + 2 * quiet}`}
      shapeRendering="crispEdges"
      className={className}
    >
      <rect
        x={-quiet}
        y={-quiet}
        width={size + 2 * quiet}
        height={size + 2 * quiet}
        fill="#ffffff"
      />
      <path d={cells} fill="#0a1f2b" />
    </svg>
  );
}
