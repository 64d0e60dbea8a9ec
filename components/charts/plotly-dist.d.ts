// plotly.js-dist-min ships no types; it is the same API as plotly.js (@types/plotly.js).
declare module "plotly.js-dist-min" {
  import Plotly from "plotly.js";
  export default Plotly;
}
