export * from './psychrometrics';
