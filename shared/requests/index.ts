export * from './application-schema';
export * from './choices';
