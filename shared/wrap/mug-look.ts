/**
 * How a mug preview draws what the wrap geometry does not give: the handle, the opening and their
 * light. One set of proportions for the server's previews and the editor's live one, so the two
 * look alike. Our own choice of look, not a measurement of any blank.
 */
export const MUG_LOOK = {
  /** How far the handle reaches out from the body, as a share of the radius. */
  handleReach: 0.55,
  /** The handle's thickness, as a share of the radius. */
  handleThickness: 0.14,
  /** Half the handle's height, as a share of the body's height. */
  handleHalfHeight: 0.36,
  /** The handle's brightness against the lit body. */
  handleLight: 0.8,
  /** The far half of the opening seen a little from above: its height against the body's half-width. */
  openingTilt: 0.07,
  /** The inside wall's brightness at the back and at the front rim. */
  insideLight: { back: 0.5, front: 0.78 },
  /** The rim's brightness round the opening. */
  rimLight: 0.85,
} as const;
