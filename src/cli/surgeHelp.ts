/** The help of `headroute surge`, apart from the command so `--help` loads no solver code. */

/** The help text of `headroute surge`. */
export const SURGE_HELP = `  headroute surge FILE [--case ID] (--close ELEMENT_ID --time SECONDS
                       [--law linear|characteristic] | --trip PUMP_ID [--inertia KGM2])
                       [--duration SECONDS] [--route ID] --format json|text|csv|svg
      Surge screening along a route: the highest and lowest HGL over the event, where the
      column separates (vapour cavities), Joukowsky a·Δv/g and 2L/a, and findings. Method
      of characteristics with steady friction and a discrete vapour cavity model.
      --close ID      a valve (control valve or gate/globe/ball/butterfly) closes ...
      --time S        ... over S seconds (0: at once)
      --law L         linear (opening falls linearly; default) or characteristic (a
                      control valve's travel falls linearly through its characteristic)
      --trip ID       a pump trips (its drive is cut)
      --inertia I     its rotating inertia, kg·m² (default: estimated from its power)
      --duration S    simulated time (default 30 s)
      --route ID      a stored route (default: a stored route, or the default route,
                      through the element)
      JSON is SI; text, csv and svg are in m and s. Exit 1 when the run cannot be made.
`;
