/** Where the pins are kept in the browser, and how many there may be (on the first screen: the pin button counts them). */
export const PINS_KEY = 'raincut.pins';
export const MAX_PINS = 4;
