/** Phones and tablets have no arrow keys: nothing to listen to. */
export function useArrowKeys(_enabled: boolean): void {}
