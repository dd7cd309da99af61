/** The wizard's fixed choices with the words people read for each. */
export const roadOwners = ['county', 'town', 'state', 'private', 'not_sure'] as const;
export const roadOwnerText: Record<(typeof roadOwners)[number], string> = {
  county: 'The county',
  town: 'The town or township',
  state: 'The state',
  private: 'A private road',
  not_sure: 'Not sure',
};

export const positionKinds = ['landmark', 'coordinates'] as const;
export const positionKindText: Record<(typeof positionKinds)[number], string> = {
  landmark: 'Distance from a landmark',
  coordinates: 'Map coordinates',
};

export const entranceWorks = ['new', 'widen'] as const;
export const entranceWorkText: Record<(typeof entranceWorks)[number], string> = {
  new: 'A new entrance',
  widen: 'Widen or rebuild an existing entrance',
};

export const entranceUses = ['home', 'farm', 'business'] as const;
export const entranceUseText: Record<(typeof entranceUses)[number], string> = {
  home: 'A home',
  farm: 'A farm or field',
  business: 'A business',
};

export const vehicleKinds = ['cars', 'trucks', 'trailers'] as const;
export const vehicleKindText: Record<(typeof vehicleKinds)[number], string> = {
  cars: 'Cars and pickups',
  trucks: 'Delivery or farm trucks',
  trailers: 'Trailers, campers or long loads',
};

export const drainageKinds = ['none', 'ditch', 'culvert', 'not_sure'] as const;
export const drainageKindText: Record<(typeof drainageKinds)[number], string> = {
  none: 'No ditch along the road here',
  ditch: 'An open ditch, no pipe',
  culvert: 'A ditch with a culvert pipe already',
  not_sure: 'Not sure',
};

export const timings = ['soon', 'within_3_months', 'this_year', 'flexible'] as const;
export const timingText: Record<(typeof timings)[number], string> = {
  soon: 'As soon as possible',
  within_3_months: 'Within three months',
  this_year: 'This year',
  flexible: 'No hurry',
};
