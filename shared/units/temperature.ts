// Temperature conversions (definition of the Fahrenheit scale: °F = °C × 9/5 + 32).

export function cToF(temperatureC: number): number {
  return (temperatureC * 9) / 5 + 32
}

export function fToC(temperatureF: number): number {
  return ((temperatureF - 32) * 5) / 9
}
