export * from './users';
export * from './teams';
export * from './mail';
