import localFont from "next/font/local";

// Shipped with the app from @fontsource packages: nothing is fetched at build or run time.
// Only the upright text face is preloaded: it paints the first screen of every page. On a phone
// connection each preloaded file competes with the page's CSS and scripts, so the italic and the
// measure faces are fetched when text that uses them is first laid out (display: swap shows the
// fallback meanwhile).
export const textFont = localFont({
  src: [{ path: "../../public/fonts/atkinson-hyperlegible-next-latin-wght-normal.woff2", style: "normal", weight: "200 800" }],
  variable: "--font-text",
  display: "swap",
});

// Its own family, named first wherever text is set in italic (app/globals.css), so italic text
// gets the drawn italic rather than a slanted upright.
export const textItalicFont = localFont({
  src: [{ path: "../../public/fonts/atkinson-hyperlegible-next-latin-wght-italic.woff2", style: "italic", weight: "200 800" }],
  variable: "--font-text-italic",
  display: "swap",
  preload: false,
});

export const measureFont = localFont({
  src: [{ path: "../../public/fonts/atkinson-hyperlegible-mono-latin-wght-normal.woff2", style: "normal", weight: "200 800" }],
  variable: "--font-measure",
  display: "swap",
  preload: false,
});
