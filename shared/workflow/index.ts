export * from './statuses';
export * from './transitions';
