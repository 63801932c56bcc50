export * from './users';
export * from './teams';
export * from './mail';
export * from './uploads';
export * from './wells';
export * from './wellData';
export * from './planning';
export * from './interpretations';
