export * from './application-schema';
export * from './choices';
export * from './photo-rules';
