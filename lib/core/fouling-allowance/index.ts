export { TEMA_DESIGN_FOULING, TEMA_TABLE_NAME, temaDesignFouling, type TemaFoulingEntry } from "./tema-design-fouling";
