/**
 * A table wider than the phone scrolls sideways inside its own box. A keyboard user must be able
 * to reach that box to scroll it (axe: scrollable-region-focusable), so every such box is a named,
 * focusable region: spread `scrollArea("Members")` on the wrapping element.
 */
export function scrollArea(label: string) {
  return { role: "region", tabIndex: 0, "aria-label": `${label} (scrolls sideways)` } as const;
}
