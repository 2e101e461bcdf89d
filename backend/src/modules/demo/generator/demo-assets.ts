/** Small binary and text assets the handbook's pages point at; enough bytes to be real files of their type. */
function fromBase64(b64: string): Uint8Array {
  return new Uint8Array(Buffer.from(b64, 'base64'));
}

// A 1x1 transparent PNG (the smallest valid PNG: signature, IHDR, IDAT, IEND).
const PNG_1X1 = 'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNkYPhfDwAChwGA60e6kgAAAABJRU5ErkJggg==';

const PDF = `%PDF-1.4
1 0 obj << /Type /Catalog /Pages 2 0 R >> endobj
2 0 obj << /Type /Pages /Kids [] /Count 0 >> endobj
trailer << /Root 1 0 R >>
%%EOF
`;

const LOGO_SVG = `<svg xmlns="http://www.w3.org/2000/svg" width="64" height="64" viewBox="0 0 64 64">
  <title>Brackenridge Tool Library Network</title>
  <circle cx="32" cy="32" r="30" fill="#2f6f4e"/>
  <path d="M20 44 L44 20 M38 18 l8 8" stroke="#fff" stroke-width="5" stroke-linecap="round"/>
</svg>
`;

export function demoAssets(): Record<string, string | Uint8Array> {
  return {
    'assets/depot-map.png': fromBase64(PNG_1X1),
    'assets/logo.svg': LOGO_SVG,
    'assets/bench-check-form.pdf': new TextEncoder().encode(PDF),
  };
}
