export * from './shape';
export * from './takeoff';
