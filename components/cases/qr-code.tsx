import QRCode from "qrcode";

/** A QR code (error correction M, four-module quiet zone) drawn as one SVG path. */
export function QrCode({ text, label, sizeMm = 34 }: { text: string; label: string; sizeMm?: number }) {
  const { modules } = QRCode.create(text, { errorCorrectionLevel: "M" });
  const quiet = 4;
  const span = modules.size + 2 * quiet;
  let d = "";
  for (let row = 0; row < modules.size; row++) {
    for (let col = 0; col < modules.size; col++) if (modules.get(row, col)) d += `M${col + quiet} ${row + quiet}h1v1h-1z`;
  }
  return (
    <svg role="img" aria-label={label} viewBox={`0 0 ${span} ${span}`} width={`${sizeMm}mm`} height={`${sizeMm}mm`} shapeRendering="crispEdges" data-testid="job-card-qr">
      <rect width={span} height={span} fill="#ffffff" />
      <path d={d} fill="#000000" />
    </svg>
  );
}
