import "server-only";

/**
 * The app's public origin for the QR code on a card: NEXTAUTH_URL, which
 * sign-in needs anyway; failing that, the origin the request came in on.
 */
export function cardBaseUrl(req: Request): string {
  const configured = process.env.NEXTAUTH_URL?.trim();
  if (configured) {
    try {
      return new URL(configured).toString();
    } catch {
      // A malformed setting is sign-in's problem to report; the request's own origin still works for a QR code.
    }
  }
  return new URL(req.url).origin;
}

/** A PDF download: never cached (loads change when maxes do), named by Content-Disposition. */
export function pdfResponse(pdf: Buffer, disposition: string): Response {
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": disposition,
      "content-length": String(pdf.length),
      "cache-control": "private, no-store",
    },
  });
}
