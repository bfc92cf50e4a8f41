// The one modal lives in components/ui (the athlete's log sheet uses it too); planner code imports it from here.
export { Dialog } from "@/components/ui/dialog";
