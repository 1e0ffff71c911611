export * from './quaternion';
