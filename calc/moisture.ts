// Moisture screen: steady-state temperature at each layer interface at design
// conditions, T_x = T_in − (T_in − T_out)·R_in→x / R_total, compared with the indoor
// dew point from psychrolib (ASHRAE Handbook psychrometric equations). A screening
// check, not a hygrothermal simulation.
import psychrolib from "psychrolib";
import type { AssemblyResult } from "./assemblies";

psychrolib.SetUnitSystem(psychrolib.IP);

export const indoorDewPointF = (indoorF: number, rh: number) => psychrolib.GetTDewPointFromRelHum(indoorF, rh);

export interface InterfaceTemp { outerLayer: string; innerLayer: string; tempF: number; belowDewPoint: boolean }
export interface MoistureScreen {
  assemblyKey: string; assemblyName: string; indoorF: number; outdoorF: number; indoorRH: number; dewPointF: number;
  interfaces: InterfaceTemp[]; atRisk: InterfaceTemp[]; message: string;
}

const f1 = (x: number) => `${x.toFixed(1)} °F`;

export function moistureScreen(a: AssemblyResult, indoorF: number, outdoorF: number, indoorRH: number, dewPointF?: number): MoistureScreen {
  return moistureScreener(indoorF, outdoorF, indoorRH, dewPointF)(a);
}

/** moistureScreen for many assemblies at the same conditions (the dew point and the message's first sentence once). */
export function moistureScreener(indoorF: number, outdoorF: number, indoorRH: number, dewPointF?: number): (a: AssemblyResult) => MoistureScreen {
  const dew = dewPointF ?? indoorDewPointF(indoorF, indoorRH);
  const head = `At ${f1(outdoorF)} outdoors and ${f1(indoorF)} at ${Math.round(indoorRH * 100)} % relative humidity indoors, the indoor dew point is ${f1(dew)}.`;
  return (a) => {
    const layers = a.cavityPath;
    let total = 0;
    for (const l of layers) total += l.rValueIP;
    const interfaces: InterfaceTemp[] = [];
    let rIn = 0;
    for (let i = layers.length - 1; i > 0; i--) {
      rIn += layers[i].rValueIP;
      const t = indoorF - ((indoorF - outdoorF) * rIn) / total;
      interfaces.push({ outerLayer: layers[i - 1].label, innerLayer: layers[i].label, tempF: t, belowDewPoint: t < dew });
    }
    const atRisk = interfaces.filter((x) => x.belowDewPoint && !/air film/i.test(x.outerLayer));
    const tail = "This is a screening check at design conditions, not a hygrothermal simulation.";
    const message = atRisk.length === 0
      ? `${head} No layer surface along the cavity of "${a.name}" is below it. ${tail}`
      : `${head} In "${a.name}", ${atRisk.map((x) => `the inner face of ${x.outerLayer} (${f1(x.tempF)})`).join(", ")} ${atRisk.length > 1 ? "are" : "is"} colder than that: indoor air that reaches ${atRisk.length > 1 ? "these surfaces" : "it"} can condense or frost. Keep the interior side airtight and let the outside dry. ${tail}`;
    return { assemblyKey: a.key, assemblyName: a.name, indoorF, outdoorF, indoorRH, dewPointF: dew, interfaces, atRisk, message };
  };
}
