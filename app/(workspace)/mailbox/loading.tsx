export { default } from "../alerts/loading";
