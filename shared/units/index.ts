export * from './length'
export * from './area'
export * from './temperature'
export * from './format'
