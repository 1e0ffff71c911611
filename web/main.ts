// The workbench's entry: one element holds the whole page.
import './components/dg-app';
