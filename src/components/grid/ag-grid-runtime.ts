// AG Grid's code for the schedule grid, loaded as a chunk of its own (schedule-grid.tsx imports it
// dynamically). Only the grid's parts the sheet uses are registered (the whole community set is a
// third more code for the browser to compile before the first rows): the client-side rows,
// text/number/select editors, column and external filters, row selection, the pinned totals row,
// cell classes, tooltips and the API calls of src/components/grid.
import {
  CellApiModule,
  CellStyleModule,
  ClientSideRowModelApiModule,
  ClientSideRowModelModule,
  ColumnApiModule,
  EventApiModule,
  ExternalFilterModule,
  ModuleRegistry,
  NumberEditorModule,
  NumberFilterModule,
  PinnedRowModule,
  RenderApiModule,
  RowApiModule,
  RowSelectionModule,
  ScrollApiModule,
  SelectEditorModule,
  TextEditorModule,
  TextFilterModule,
  TooltipModule,
} from "ag-grid-community";

ModuleRegistry.registerModules([
  ClientSideRowModelModule,
  ClientSideRowModelApiModule,
  TextEditorModule,
  NumberEditorModule,
  SelectEditorModule,
  TextFilterModule,
  NumberFilterModule,
  ExternalFilterModule,
  RowSelectionModule,
  PinnedRowModule,
  CellStyleModule,
  TooltipModule,
  ColumnApiModule,
  RowApiModule,
  ScrollApiModule,
  RenderApiModule,
  EventApiModule,
  CellApiModule,
]);

export { createGrid } from "ag-grid-community";
export { gridTheme } from "./grid-theme";
