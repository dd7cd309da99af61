/** The choices the wizard offers, with the words the homeowner reads. Values are what the server stores. */
export const roadOwners = ['county', 'town', 'state', 'private', 'not_sure'] as const;
export const roadOwnerLabels: Record<(typeof roadOwners)[number], string> = {
  county: 'The county', town: 'The town', state: 'The state', private: 'Private road', not_sure: 'Not sure',
};

export const positionKinds = ['landmark', 'coordinates'] as const;
export const positionKindLabels: Record<(typeof positionKinds)[number], string> = {
  landmark: 'Distance from a landmark', coordinates: 'Map coordinates',
};

export const entranceKinds = ['new', 'widen'] as const;
export const entranceKindLabels: Record<(typeof entranceKinds)[number], string> = {
  new: 'A new entrance', widen: 'Widen or rebuild an existing one',
};

export const entranceUses = ['home', 'farm', 'business'] as const;
export const entranceUseLabels: Record<(typeof entranceUses)[number], string> = {
  home: 'Home', farm: 'Farm or field', business: 'Business',
};

export const vehicleKinds = ['cars', 'trucks', 'trailers'] as const;
export const vehicleKindLabels: Record<(typeof vehicleKinds)[number], string> = {
  cars: 'Cars and pickups', trucks: 'Delivery or farm trucks', trailers: 'Trailers or campers',
};

export const drainageKinds = ['none', 'ditch', 'culvert', 'not_sure'] as const;
export const drainageKindLabels: Record<(typeof drainageKinds)[number], string> = {
  none: 'No ditch along the road', ditch: 'An open ditch', culvert: 'A ditch with a culvert pipe already', not_sure: 'Not sure',
};

export const timings = ['asap', 'within_3_months', 'this_year', 'flexible'] as const;
export const timingLabels: Record<(typeof timings)[number], string> = {
  asap: 'As soon as possible', within_3_months: 'Within three months', this_year: 'This year', flexible: 'No hurry',
};

/** The wizard's steps in order; the photos and review steps keep nothing in the application itself. */
export const wizardSteps = ['site', 'entrance', 'photos', 'review'] as const;
export type WizardStep = (typeof wizardSteps)[number];
export const wizardStepLabels: Record<WizardStep, string> = {
  site: 'The property and the road', entrance: 'The entrance you want', photos: 'Photos', review: 'Review and send',
};
