// fontkit comes with @react-pdf/renderer (it reads fonts for the PDF); the WOFF test uses it as an independent
// decoder. Only the call the test makes is declared.
declare module "fontkit" {
  export function create(buffer: Uint8Array): unknown;
}
