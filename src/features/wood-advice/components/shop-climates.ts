/**
 * Typical indoor conditions a buyer can start from. Invented presets for Stickerline (common
 * practice ranges, not measured data); the buyer can type their own.
 */
export const SHOP_CLIMATES = [
  { id: 'heated-winter', label: 'Heated house in winter', temperatureF: 68, relativeHumidityPercent: 30 },
  { id: 'mild-spring', label: 'Indoors, spring or autumn', temperatureF: 68, relativeHumidityPercent: 45 },
  { id: 'humid-summer', label: 'Humid summer, no air conditioning', temperatureF: 80, relativeHumidityPercent: 75 },
  { id: 'unheated-shop', label: 'Unheated garage shop', temperatureF: 50, relativeHumidityPercent: 65 },
] as const;
