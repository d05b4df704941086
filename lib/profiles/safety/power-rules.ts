// What the door does when power returns.
import { finding } from "./rules";
import type { RuleCheck } from "./types";

/** RL-POWER-UP-OPEN: opening at power-up opens the door at night after a power cut. */
export const checkPowerUpOpen: RuleCheck = ({ doc }) =>
  doc.powerUpMode !== "open"
    ? []
    : [
        finding(
          "RL-POWER-UP-OPEN",
          "warning",
          ["/powerUpMode"],
          "Power-up mode “open”: when power returns after a cut at night the door opens in the dark, to predators. “scheduled” closes it again when power returns after closing time.",
        ),
      ];

/** RL-HOMING-OFF: without homing the close count starts from wherever the count was lost. */
export const checkHomingOff: RuleCheck = ({ doc }) =>
  doc.homeOnPowerUp
    ? []
    : [
        finding(
          "RL-HOMING-OFF",
          "warning",
          ["/homeOnPowerUp"],
          "Homing on power-up is off: after a power cut the controller trusts an encoder count it may have lost, so the next close can stop short and leave a gap, or drive past the closed end. Stall detection is a second line of defence, not a guarantee.",
        ),
      ];
