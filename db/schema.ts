// The whole Hitchmark schema. Tables live in db/tables/ by area; drizzle-kit and the app import this file.
export * from './tables/common';
export * from './tables/core';
export * from './tables/gate';
export * from './tables/conditions';
export * from './tables/yard';
export * from './tables/desk';
