export { UnitsNote } from './components/units-note';
