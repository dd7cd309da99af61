export * from './statuses';
export * from './transitions';
export * from './event-kinds';
